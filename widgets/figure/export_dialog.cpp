#include "widgets/figure/export_dialog.h"

#include <QApplication>
#include <QCheckBox>
#include <QClipboard>
#include <QComboBox>
#include <QDialogButtonBox>
#include <QDoubleSpinBox>
#include <QFileDialog>
#include <QFormLayout>
#include <QHBoxLayout>
#include <QLabel>
#include <QLineEdit>
#include <QMessageBox>
#include <QMimeData>
#include <QPushButton>
#include <QSpinBox>
#include <QVBoxLayout>

#include "core/errors.h"
#include "widgets/figure/figure_export.h"
#include "widgets/figure/figure_render.h"
#include "widgets/settings.h"

namespace pw::ui {
namespace {

constexpr int kPreviewDpi = 96;  // the preview is laid out exactly like the file, at 96 dpi

QCheckBox *check(const QString &text, QWidget *parent) { return new QCheckBox(text, parent); }

}  // namespace

ExportDialog::ExportDialog(DiagramScene scene, Settings &settings, QWidget *parent)
    : QDialog(parent), scene_(std::move(scene)), settings_(settings) {
    setWindowTitle(tr("Export Figure"));
    build();
    FigureSpec remembered = settings_.figureSpec();
    if (remembered.title.isEmpty()) remembered.title = scene_.title;
    setSpec(remembered);
    previewTimer_.setSingleShot(true);
    previewTimer_.setInterval(120);
    connect(&previewTimer_, &QTimer::timeout, this, &ExportDialog::updatePreview);
    updatePreview();
}

void ExportDialog::build() {
    format_ = new QComboBox(this);
    for (FigureFormat f : {FigureFormat::Png, FigureFormat::Svg, FigureFormat::Pdf})
        format_->addItem(figureFormatName(f), static_cast<int>(f));
    preset_ = new QComboBox(this);
    preset_->addItem(tr("One column (85 mm)"), 85.0);
    preset_->addItem(tr("Two columns (170 mm)"), 170.0);
    preset_->addItem(tr("Custom"), 0.0);
    widthMm_ = new QDoubleSpinBox(this);
    widthMm_->setRange(10, 1000);
    widthMm_->setSuffix(tr(" mm"));
    heightMm_ = new QDoubleSpinBox(this);
    heightMm_->setRange(0, 3000);
    heightMm_->setSuffix(tr(" mm"));
    heightMm_->setSpecialValueText(tr("automatic"));
    dpi_ = new QSpinBox(this);
    dpi_->setRange(50, 2400);
    dpi_->setSingleStep(50);
    dpi_->setSuffix(tr(" dpi"));
    title_ = new QLineEdit(this);
    legend_ = check(tr("Legend"), this);
    caption_ = check(tr("Caption: sources, models, version and date"), this);
    caution_ = check(tr("Caution line (high pressure, cryogenic, vacuum work)"), this);
    phases_ = check(tr("Phase beside each point label"), this);
    sizeLabel_ = new QLabel(this);

    auto *form = new QFormLayout;
    form->addRow(tr("Format"), format_);
    form->addRow(tr("Size"), preset_);
    form->addRow(tr("Width"), widthMm_);
    form->addRow(tr("Height"), heightMm_);
    form->addRow(tr("Resolution (PNG)"), dpi_);
    form->addRow(QString(), sizeLabel_);
    form->addRow(tr("Title"), title_);
    for (QCheckBox *c : {legend_, caption_, caution_, phases_}) form->addRow(QString(), c);

    previewLabel_ = new QLabel(this);
    previewLabel_->setMinimumSize(420, 360);
    previewLabel_->setAlignment(Qt::AlignCenter);
    previewLabel_->setFrameShape(QFrame::StyledPanel);

    auto *buttons = new QDialogButtonBox(QDialogButtonBox::Close, this);
    QPushButton *exportButton = buttons->addButton(tr("Export…"), QDialogButtonBox::AcceptRole);
    QPushButton *copyButton = buttons->addButton(tr("Copy"), QDialogButtonBox::ActionRole);
    connect(exportButton, &QPushButton::clicked, this, &ExportDialog::chooseFileAndExport);
    connect(copyButton, &QPushButton::clicked, this, &ExportDialog::copyToClipboard);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);

    auto *top = new QHBoxLayout;
    top->addLayout(form);
    top->addWidget(previewLabel_, 1);
    auto *layout = new QVBoxLayout(this);
    layout->addLayout(top);
    layout->addWidget(buttons);

    connect(preset_, &QComboBox::currentIndexChanged, this, [this] {
        const double w = preset_->currentData().toDouble();
        if (w > 0) widthMm_->setValue(w);
    });
    connect(widthMm_, &QDoubleSpinBox::valueChanged, this, [this](double w) {
        const int i = preset_->findData(w);
        preset_->setCurrentIndex(i >= 0 ? i : preset_->count() - 1);
    });
    for (QComboBox *c : {format_, preset_})
        connect(c, &QComboBox::currentIndexChanged, this, &ExportDialog::schedulePreview);
    for (QDoubleSpinBox *s : {widthMm_, heightMm_})
        connect(s, &QDoubleSpinBox::valueChanged, this, &ExportDialog::schedulePreview);
    connect(dpi_, &QSpinBox::valueChanged, this, &ExportDialog::schedulePreview);
    connect(title_, &QLineEdit::textChanged, this, &ExportDialog::schedulePreview);
    for (QCheckBox *c : {legend_, caption_, caution_, phases_})
        connect(c, &QCheckBox::toggled, this, &ExportDialog::schedulePreview);
}

FigureSpec ExportDialog::spec() const {
    FigureSpec s;
    s.format = static_cast<FigureFormat>(format_->currentData().toInt());
    s.widthMm = widthMm_->value();
    s.heightMm = heightMm_->value();
    s.dpi = dpi_->value();
    s.title = title_->text();
    s.legend = legend_->isChecked();
    s.caption = caption_->isChecked();
    s.caution = caution_->isChecked();
    s.pointPhases = phases_->isChecked();
    return s;
}

void ExportDialog::setSpec(const FigureSpec &s) {
    format_->setCurrentIndex(format_->findData(static_cast<int>(s.format)));
    widthMm_->setValue(s.widthMm);
    heightMm_->setValue(s.heightMm);
    dpi_->setValue(s.dpi);
    title_->setText(s.title);
    legend_->setChecked(s.legend);
    caption_->setChecked(s.caption);
    caution_->setChecked(s.caution);
    phases_->setChecked(s.pointPhases);
    schedulePreview();
}

void ExportDialog::schedulePreview() { previewTimer_.start(); }

void ExportDialog::updatePreview() {
    FigureSpec s = resolveFigureHeight(scene_, spec());
    const QSize px = figurePixelSize(s);
    const QSizeF mm = figureSizeMm(s);
    sizeLabel_->setText(
        s.format == FigureFormat::Png
            ? tr("%1 × %2 pixels").arg(px.width()).arg(px.height())
            : tr("%1 × %2 mm, vector").arg(mm.width(), 0, 'f', 1).arg(mm.height(), 0, 'f', 1));
    s.dpi = kPreviewDpi;
    try {
        validateFigureSpec(s);
        preview_ = renderFigureImage(scene_, s);
    } catch (const Error &e) {
        preview_ = QImage();
        previewLabel_->setText(QString::fromUtf8(e.what()));
        return;
    }
    previewLabel_->setPixmap(QPixmap::fromImage(preview_).scaled(
        previewLabel_->size(), Qt::KeepAspectRatio, Qt::SmoothTransformation));
}

void ExportDialog::remember() {
    FigureSpec s = spec();
    s.title.clear();  // a title belongs to one figure
    settings_.setFigureSpec(s);
}

bool ExportDialog::exportTo(const QString &path, QString *error) {
    try {
        exportFigure(scene_, spec(), path);
    } catch (const Error &e) {
        if (error)
            *error = QString::fromUtf8(e.what());
        else
            QMessageBox::warning(this, tr("Export Figure"), QString::fromUtf8(e.what()));
        return false;
    }
    remember();
    return true;
}

void ExportDialog::chooseFileAndExport() {
    const FigureSpec s = spec();
    const QString ext = figureFormatName(s.format).toLower();
    const QString path =
        QFileDialog::getSaveFileName(this, tr("Export Figure"), settings_.lastDirectory(),
                                     tr("%1 files (*.%2)").arg(figureFormatName(s.format), ext));
    if (path.isEmpty()) return;
    const QString withExt = path.endsWith(QLatin1Char('.') + ext, Qt::CaseInsensitive)
                                ? path
                                : path + QLatin1Char('.') + ext;
    if (exportTo(withExt)) accept();
}

void ExportDialog::copyFigure(const DiagramScene &scene, const FigureSpec &spec) {
    FigureSpec png = spec;
    png.format = FigureFormat::Png;
    FigureSpec svg = spec;
    svg.format = FigureFormat::Svg;
    auto *mime = new QMimeData;
    mime->setImageData(renderFigureImage(scene, png));
    mime->setData(QStringLiteral("image/svg+xml"), renderFigureBytes(scene, svg));
    QApplication::clipboard()->setMimeData(mime);
}

void ExportDialog::copyToClipboard() {
    try {
        validateFigureSpec(spec());
        copyFigure(scene_, spec());
    } catch (const Error &e) {
        QMessageBox::warning(this, tr("Copy Figure"), QString::fromUtf8(e.what()));
        return;
    }
    remember();
}

}  // namespace pw::ui
