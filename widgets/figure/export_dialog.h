#pragma once
// File > Export Figure…: the figure options (format, physical width and DPI or pixels, title,
// legend, source caption, caution line, point phases) with a live preview drawn by the same
// code as the file (widgets/figure/figure_export.h). The options are remembered through the
// typed Settings object; Copy puts the figure on the clipboard (PNG image and SVG).
#include <QDialog>
#include <QTimer>

#include "widgets/diagram_scene.h"
#include "widgets/figure/figure_spec.h"

class QCheckBox;
class QComboBox;
class QDoubleSpinBox;
class QLabel;
class QLineEdit;
class QSpinBox;

namespace pw::ui {

class Settings;

class ExportDialog : public QDialog {
    Q_OBJECT
public:
    ExportDialog(DiagramScene scene, Settings &settings, QWidget *parent = nullptr);

    FigureSpec spec() const;  // the options as shown
    void setSpec(const FigureSpec &spec);
    // Writes the figure (format from the spec); remembers the options. False with a message
    // box (or `error`, when given) on failure.
    bool exportTo(const QString &path, QString *error = nullptr);
    void copyToClipboard();
    const QImage &previewImage() const { return preview_; }

    // Puts the figure of `scene` with `spec` on the clipboard (PNG image and SVG text).
    static void copyFigure(const DiagramScene &scene, const FigureSpec &spec);

private:
    void build();
    void schedulePreview();
    void updatePreview();
    void chooseFileAndExport();
    void remember();

    DiagramScene scene_;
    Settings &settings_;
    QTimer previewTimer_;
    QImage preview_;
    QComboBox *format_ = nullptr;
    QComboBox *preset_ = nullptr;
    QDoubleSpinBox *widthMm_ = nullptr;
    QDoubleSpinBox *heightMm_ = nullptr;
    QSpinBox *dpi_ = nullptr;
    QLineEdit *title_ = nullptr;
    QCheckBox *legend_ = nullptr;
    QCheckBox *caption_ = nullptr;
    QCheckBox *caution_ = nullptr;
    QCheckBox *phases_ = nullptr;
    QLabel *previewLabel_ = nullptr;
    QLabel *sizeLabel_ = nullptr;
};

}  // namespace pw::ui
