#include "widgets/runs/run_import_dialog.h"

#include <QCheckBox>
#include <QComboBox>
#include <QDialogButtonBox>
#include <QFileDialog>
#include <QFormLayout>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QLineEdit>
#include <QProgressBar>
#include <QPushButton>
#include <QTableWidget>
#include <QVBoxLayout>
#include <array>

#include "core/errors.h"

namespace pw::ui {

namespace {

constexpr std::array kTemperatureUnits{TemperatureUnit::Kelvin, TemperatureUnit::Celsius,
                                       TemperatureUnit::Fahrenheit, TemperatureUnit::Rankine};
constexpr std::array kPressureUnits{PressureUnit::Pa,    PressureUnit::kPa,  PressureUnit::MPa,
                                    PressureUnit::GPa,   PressureUnit::bar,  PressureUnit::mbar,
                                    PressureUnit::ubar,  PressureUnit::atm,  PressureUnit::Torr,
                                    PressureUnit::mTorr, PressureUnit::mmHg, PressureUnit::psi};

QString sym(std::string_view s) { return QString::fromUtf8(s.data(), static_cast<int>(s.size())); }

}  // namespace

RunImportDialog::RunImportDialog(DiagramPtr diagram, QWidget *parent)
    : QDialog(parent),
      diagram_(std::move(diagram)),
      path_(new QLineEdit),
      timeColumn_(new QComboBox),
      tColumn_(new QComboBox),
      pColumn_(new QComboBox),
      tUnit_(new QComboBox),
      pUnit_(new QComboBox),
      timeUnit_(new QComboBox),
      gauge_(new QCheckBox(tr("gauge pressure (add 1 atm)"))),
      preview_(new QTableWidget),
      notes_(new QLabel),
      status_(new QLabel),
      progress_(new QProgressBar),
      importButton_(new QPushButton(tr("Import"))),
      cancelButton_(new QPushButton(tr("Cancel"))) {
    setWindowTitle(tr("Import run log"));
    resize(760, 560);
    auto *layout = new QVBoxLayout(this);
    auto *fileRow = new QHBoxLayout;
    auto *browseButton = new QPushButton(tr("Browse…"));
    fileRow->addWidget(new QLabel(tr("File:")));
    fileRow->addWidget(path_, 1);
    fileRow->addWidget(browseButton);
    layout->addLayout(fileRow);

    for (TemperatureUnit u : kTemperatureUnits) tUnit_->addItem(sym(symbol(u)));
    for (PressureUnit u : kPressureUnits) pUnit_->addItem(sym(symbol(u)));
    for (const char *u : {"s", "min", "h", "d"}) timeUnit_->addItem(QString::fromLatin1(u));
    auto *form = new QFormLayout;
    auto *timeRow = new QHBoxLayout;
    timeRow->addWidget(timeColumn_, 1);
    timeRow->addWidget(timeUnit_);
    auto *tRow = new QHBoxLayout;
    tRow->addWidget(tColumn_, 1);
    tRow->addWidget(tUnit_);
    auto *pRow = new QHBoxLayout;
    pRow->addWidget(pColumn_, 1);
    pRow->addWidget(pUnit_);
    pRow->addWidget(gauge_);
    form->addRow(tr("Time column:"), timeRow);
    form->addRow(tr("Temperature column:"), tRow);
    form->addRow(tr("Pressure column:"), pRow);
    layout->addLayout(form);
    notes_->setWordWrap(true);
    layout->addWidget(notes_);
    preview_->setEditTriggers(QAbstractItemView::NoEditTriggers);
    preview_->verticalHeader()->setVisible(false);
    layout->addWidget(preview_, 1);
    status_->setWordWrap(true);
    layout->addWidget(status_);
    progress_->setRange(0, 100);
    progress_->setVisible(false);
    layout->addWidget(progress_);
    auto *buttons = new QDialogButtonBox;
    buttons->addButton(importButton_, QDialogButtonBox::AcceptRole);
    buttons->addButton(cancelButton_, QDialogButtonBox::RejectRole);
    layout->addWidget(buttons);
    importButton_->setEnabled(false);

    connect(browseButton, &QPushButton::clicked, this, &RunImportDialog::browse);
    connect(path_, &QLineEdit::editingFinished, this, [this] { setPath(path_->text()); });
    connect(importButton_, &QPushButton::clicked, this, &RunImportDialog::startImport);
    connect(cancelButton_, &QPushButton::clicked, this, &RunImportDialog::reject);
}

RunImportDialog::~RunImportDialog() = default;  // ~RunImportJob cancels and joins

void RunImportDialog::browse() {
    const QString path = QFileDialog::getOpenFileName(
        this, tr("Import run log"), QString(), tr("Run logs (*.csv *.tsv *.txt);;All files (*)"));
    if (!path.isEmpty()) setPath(path);
}

bool RunImportDialog::setPath(const QString &path) {
    path_->setText(path);
    importButton_->setEnabled(false);
    try {
        const run::RunLogPreview p = run::previewRunLogFile(path.toStdString());
        const auto &L = p.layout;
        QStringList header;
        for (const auto &h : L.header) header << QString::fromStdString(h);
        for (QComboBox *c : {timeColumn_, tColumn_, pColumn_}) {
            c->clear();
            c->addItems(header);
        }
        timeColumn_->setCurrentIndex(static_cast<int>(L.timeColumn));
        tColumn_->setCurrentIndex(static_cast<int>(L.temperatureColumn));
        pColumn_->setCurrentIndex(static_cast<int>(L.pressureColumn));
        tUnit_->setCurrentText(sym(symbol(L.temperatureUnit)));
        pUnit_->setCurrentText(sym(symbol(L.pressureUnit)));
        gauge_->setChecked(L.gauge);
        const bool iso = L.timeFormat == run::TimeFormat::Iso8601;
        timeUnit_->setEnabled(!iso);
        const std::array<std::pair<double, const char *>, 4> units{
            {{1, "s"}, {60, "min"}, {3600, "h"}, {86400, "d"}}};
        for (const auto &[secs, name] : units)
            if (secs == L.timeUnit_s) timeUnit_->setCurrentText(QString::fromLatin1(name));
        QStringList notes;
        if (iso) notes << tr("time: ISO 8601 timestamps");
        for (const auto &n : L.notes) notes << QString::fromStdString(n);
        notes_->setText(notes.join(QStringLiteral("\n")));
        preview_->clear();
        preview_->setColumnCount(static_cast<int>(header.size()));
        preview_->setHorizontalHeaderLabels(header);
        preview_->setRowCount(static_cast<int>(p.rows.size()));
        for (std::size_t r = 0; r < p.rows.size(); ++r)
            for (std::size_t c = 0; c < p.rows[r].size(); ++c)
                preview_->setItem(static_cast<int>(r), static_cast<int>(c),
                                  new QTableWidgetItem(QString::fromStdString(p.rows[r][c])));
        preview_->resizeColumnsToContents();
        status_->setText(tr("Check the columns and units, then Import."));
        importButton_->setEnabled(true);
        return true;
    } catch (const std::exception &e) {
        status_->setText(QString::fromStdString(e.what()));
        return false;
    }
}

run::RunLogOptions RunImportDialog::options() const {
    run::RunLogOptions o;
    o.timeColumn = timeColumn_->currentText().toStdString();
    o.temperatureColumn = tColumn_->currentText().toStdString();
    o.pressureColumn = pColumn_->currentText().toStdString();
    o.temperatureUnit = kTemperatureUnits.at(static_cast<std::size_t>(tUnit_->currentIndex()));
    o.pressureUnit = kPressureUnits.at(static_cast<std::size_t>(pUnit_->currentIndex()));
    o.gauge = gauge_->isChecked();
    if (timeUnit_->isEnabled()) {
        const std::array<double, 4> secs{1, 60, 3600, 86400};
        o.timeUnit_s = secs.at(static_cast<std::size_t>(timeUnit_->currentIndex()));
    }
    return o;
}

RunImportJob *RunImportDialog::startImport() {
    if (job_ || !diagram_ || !importButton_->isEnabled()) return nullptr;
    job_ = std::make_unique<RunImportJob>(diagram_, path_->text(), options());
    connect(job_.get(), &RunImportJob::progress, progress_, [this](int percent) {
        progress_->setRange(0, percent < 0 ? 0 : 100);  // busy bar when the size is unknown
        if (percent >= 0) progress_->setValue(percent);
    });
    connect(job_.get(), &RunImportJob::finished, this, &RunImportDialog::onFinished);
    connect(job_.get(), &RunImportJob::failed, this, [this](const QString &message) {
        setBusy(false);
        status_->setText(message);
        job_.reset();
    });
    connect(job_.get(), &RunImportJob::cancelled, this, [this] {
        setBusy(false);
        status_->setText(tr("Import cancelled; nothing was loaded."));
        job_.reset();
    });
    setBusy(true);
    status_->setText(tr("Importing…"));
    job_->start();
    return job_.get();
}

void RunImportDialog::onFinished(const RunPtr &run) {
    setBusy(false);
    job_.reset();
    status_->setText(tr("Imported %1 samples.").arg(run->states.size()));
    emit imported(run);
    accept();
}

void RunImportDialog::setBusy(bool busy) {
    progress_->setVisible(busy);
    progress_->setValue(0);
    importButton_->setEnabled(!busy);
    for (QWidget *w : std::initializer_list<QWidget *>{path_, timeColumn_, tColumn_, pColumn_,
                                                       tUnit_, pUnit_, gauge_})
        w->setEnabled(!busy);
}

void RunImportDialog::reject() {
    if (job_ && job_->running()) {
        job_->cancel();  // the job reports cancelled(); the dialog stays open to show it
        return;
    }
    QDialog::reject();
}

}  // namespace pw::ui
