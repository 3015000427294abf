#pragma once
// The points panel: the table (PointsModel in a QTableView; cells edit in place), a row to
// type a new point (label, T, P in the user's units), and buttons to delete and reorder.
// Import and export are window actions; this panel only asks for them.
#include <QWidget>

#include "widgets/document.h"
#include "widgets/points_model.h"
#include "widgets/settings.h"

class QLineEdit;
class QTableView;
class QLabel;

namespace pw::ui {

class PointsTable : public QWidget {
    Q_OBJECT
public:
    PointsTable(Document &doc, Settings &settings, QWidget *parent = nullptr);

    PointsModel *model() const { return model_; }
    QTableView *view() const { return view_; }
    std::vector<int> selectedRows() const;

    // Add the point typed in the entry row; false (with a message) when a field is bad.
    bool addTypedPoint();

public slots:
    void deleteSelected();
    void moveSelected(int delta);

signals:
    void importRequested();
    void exportRequested();
    void message(const QString &text);

private:
    void updatePlaceholders();

    Document &doc_;
    Settings &settings_;
    PointsModel *model_;
    QTableView *view_;
    QLineEdit *label_;
    QLineEdit *temperature_;
    QLineEdit *pressure_;
};

}  // namespace pw::ui
