#pragma once
// Pick the substance: a search field (name, formula, id or alias, by substring) over the
// library's substances (bundled and the user's folder), and a button to open a substance file.
#include <QWidget>

#include "core/library.h"
#include "widgets/document.h"

class QLineEdit;
class QListWidget;
class QListWidgetItem;

namespace pw::ui {

class SubstanceChooser : public QWidget {
    Q_OBJECT
public:
    explicit SubstanceChooser(SubstanceLibrary &library, QWidget *parent = nullptr);

    // Re-read the library's list (after a substance file was added).
    void refresh();
    // Highlight the substance shown on the diagram.
    void setCurrent(const DiagramPtr &diagram);
    void setFilter(const QString &text);
    // Number of substances currently listed (after filtering).
    int visibleCount() const;
    // Choose the first listed substance matching the filter (Enter in the search field).
    bool chooseFirstVisible();

signals:
    void substanceChosen(pw::ui::DiagramPtr diagram);
    void openFileRequested();

private:
    void applyFilter();
    void choose(QListWidgetItem *item);

    SubstanceLibrary &library_;
    QLineEdit *search_;
    QListWidget *list_;
};

}  // namespace pw::ui
