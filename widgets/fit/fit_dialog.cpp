#include "widgets/fit/fit_dialog.h"

#include <qcustomplot.h>

#include <QApplication>
#include <QClipboard>
#include <QComboBox>
#include <QDir>
#include <QFileDialog>
#include <QFileInfo>
#include <QFormLayout>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QLineEdit>
#include <QPushButton>
#include <QRegularExpression>
#include <QSplitter>
#include <QTableWidget>
#include <QTextBrowser>
#include <QVBoxLayout>
#include <array>
#include <cmath>

#include "core/errors.h"
#include "core/fit/fit_output.h"
#include "widgets/format.h"

namespace pw::ui {

namespace {

constexpr std::array kKinds{BoundaryKind::Vaporization, BoundaryKind::Sublimation,
                            BoundaryKind::Melting};
constexpr std::array kTUnits{TemperatureUnit::Kelvin, TemperatureUnit::Celsius,
                             TemperatureUnit::Fahrenheit};
constexpr std::array kPUnits{PressureUnit::Pa,    PressureUnit::kPa,  PressureUnit::MPa,
                             PressureUnit::bar,   PressureUnit::mbar, PressureUnit::Torr,
                             PressureUnit::mTorr, PressureUnit::atm,  PressureUnit::psi};

bool needsCritical(const QString &model) { return model == QLatin1String("wagner"); }
bool needsTriple(const QString &model) {
    return model == QLatin1String("iapws-sublimation") || model == QLatin1String("simon-glatzel") ||
           model == QLatin1String("melting-polynomial");
}

QString g(double v, int digits = 6) { return QString::number(v, 'g', digits); }

}  // namespace

FitDialog::FitDialog(QString userFolder, QWidget *parent)
    : QDialog(parent),
      userFolder_(std::move(userFolder)),
      table_(new QTableWidget(0, 2)),
      tUnit_(new QComboBox),
      pUnit_(new QComboBox),
      kind_(new QComboBox),
      model_(new QComboBox),
      refLabel_(new QLabel),
      refT_(new QLineEdit),
      refP_(new QLineEdit),
      exponents_(new QLineEdit),
      name_(new QLineEdit),
      fitButton_(new QPushButton(tr("Fit"))),
      saveButton_(new QPushButton(tr("Save to my library"))),
      results_(new QTextBrowser),
      residualPlot_(new QCustomPlot),
      curvePlot_(new QCustomPlot) {
    setWindowTitle(tr("Fit a phase boundary"));
    resize(1100, 720);
    auto *split = new QSplitter(Qt::Horizontal);
    split->addWidget(buildDataPane());
    split->addWidget(buildResultPane());
    split->setStretchFactor(1, 2);
    auto *layout = new QVBoxLayout(this);
    layout->addWidget(split);
    updateModels();
}

QWidget *FitDialog::buildDataPane() {
    auto *w = new QWidget;
    auto *layout = new QVBoxLayout(w);
    for (TemperatureUnit u : kTUnits) tUnit_->addItem(unitLabel(u));
    for (PressureUnit u : kPUnits) pUnit_->addItem(unitLabel(u));
    auto *units = new QHBoxLayout;
    units->addWidget(new QLabel(tr("T in")));
    units->addWidget(tUnit_);
    units->addWidget(new QLabel(tr("P in")));
    units->addWidget(pUnit_);
    layout->addLayout(units);
    table_->setHorizontalHeaderLabels({tr("T"), tr("P")});
    table_->horizontalHeader()->setStretchLastSection(true);
    layout->addWidget(table_, 1);
    auto *rowButtons = new QHBoxLayout;
    auto *importButton = new QPushButton(tr("Import CSV…"));
    auto *pasteButton = new QPushButton(tr("Paste"));
    auto *addButton = new QPushButton(tr("Add row"));
    auto *clearButton = new QPushButton(tr("Clear"));
    for (auto *b : {importButton, pasteButton, addButton, clearButton}) rowButtons->addWidget(b);
    layout->addLayout(rowButtons);
    for (BoundaryKind k : kKinds) kind_->addItem(QString::fromStdString(std::string(toString(k))));
    auto *form = new QFormLayout;
    form->addRow(tr("Boundary:"), kind_);
    form->addRow(tr("Model:"), model_);
    auto *ref = new QHBoxLayout;
    refT_->setPlaceholderText(tr("T [K]"));
    refP_->setPlaceholderText(tr("P [Pa]"));
    ref->addWidget(refT_);
    ref->addWidget(refP_);
    form->addRow(refLabel_, ref);
    exponents_->setPlaceholderText(tr("default"));
    form->addRow(tr("Exponents:"), exponents_);
    form->addRow(tr("Substance name:"), name_);
    layout->addLayout(form);
    auto *actions = new QHBoxLayout;
    actions->addWidget(fitButton_);
    actions->addWidget(saveButton_);
    layout->addLayout(actions);
    saveButton_->setEnabled(false);

    connect(importButton, &QPushButton::clicked, this, [this] {
        const QString path = QFileDialog::getOpenFileName(this, tr("Import data"), QString(),
                                                          tr("CSV (*.csv *.tsv *.txt)"));
        if (!path.isEmpty()) loadCsv(path);
    });
    connect(pasteButton, &QPushButton::clicked, this,
            [this] { pasteText(QApplication::clipboard()->text()); });
    connect(addButton, &QPushButton::clicked, this,
            [this] { table_->insertRow(table_->rowCount()); });
    connect(clearButton, &QPushButton::clicked, this, [this] { table_->setRowCount(0); });
    connect(kind_, qOverload<int>(&QComboBox::currentIndexChanged), this, &FitDialog::updateModels);
    connect(model_, qOverload<int>(&QComboBox::currentIndexChanged), this,
            &FitDialog::updateReferenceFields);
    connect(fitButton_, &QPushButton::clicked, this, &FitDialog::fit);
    connect(saveButton_, &QPushButton::clicked, this, &FitDialog::saveToLibrary);
    return w;
}

QWidget *FitDialog::buildResultPane() {
    auto *w = new QWidget;
    auto *layout = new QVBoxLayout(w);
    layout->addWidget(results_, 2);
    auto *plots = new QHBoxLayout;
    residualPlot_->setMinimumSize(280, 220);
    curvePlot_->setMinimumSize(280, 220);
    plots->addWidget(curvePlot_);
    plots->addWidget(residualPlot_);
    layout->addLayout(plots, 3);
    residualPlot_->xAxis->setLabel(tr("T [K]"));
    residualPlot_->yAxis->setLabel(tr("deviation [%]"));
    curvePlot_->xAxis->setLabel(tr("T [K]"));
    curvePlot_->yAxis->setLabel(tr("P [Pa]"));
    curvePlot_->yAxis->setScaleType(QCPAxis::stLogarithmic);
    curvePlot_->yAxis->setTicker(QSharedPointer<QCPAxisTickerLog>::create());
    curvePlot_->yAxis->setNumberFormat(QStringLiteral("eb"));
    curvePlot_->yAxis->setNumberPrecision(0);
    return w;
}

void FitDialog::updateModels() {
    const BoundaryKind kind = kKinds.at(static_cast<std::size_t>(kind_->currentIndex()));
    model_->clear();
    for (const std::string &m : fit::availableModels(kind))
        model_->addItem(QString::fromStdString(m));
    updateReferenceFields();
}

void FitDialog::updateReferenceFields() {
    const QString m = model_->currentText();
    const bool critical = needsCritical(m), triple = needsTriple(m);
    refLabel_->setText(critical ? tr("Critical point Tc, Pc:")
                       : triple ? tr("Triple point Tt, Pt:")
                                : tr("Reference:"));
    refT_->setEnabled(critical || triple);
    refP_->setEnabled(critical || triple);
    exponents_->setEnabled(m == QLatin1String("wagner") ||
                           m == QLatin1String("iapws-sublimation") ||
                           m == QLatin1String("melting-polynomial"));
}

void FitDialog::setData(const fit::FitData &data) {
    tUnit_->setCurrentIndex(0);  // K
    pUnit_->setCurrentIndex(0);  // Pa
    table_->setRowCount(static_cast<int>(data.points.size()));
    for (std::size_t i = 0; i < data.points.size(); ++i) {
        const int row = static_cast<int>(i);
        table_->setItem(row, 0, new QTableWidgetItem(g(data.points[i].T_K, 10)));
        table_->setItem(row, 1, new QTableWidgetItem(g(data.points[i].P_Pa, 10)));
    }
    dataFile_ = QString::fromStdString(data.file);
}

fit::FitData FitDialog::data() const {
    fit::FitData d;
    d.file = dataFile_.isEmpty() ? std::string("table") : dataFile_.toStdString();
    const TemperatureUnit tu = kTUnits.at(static_cast<std::size_t>(tUnit_->currentIndex()));
    const PressureUnit pu = kPUnits.at(static_cast<std::size_t>(pUnit_->currentIndex()));
    for (int r = 0; r < table_->rowCount(); ++r) {
        const auto *ti = table_->item(r, 0);
        const auto *pi = table_->item(r, 1);
        const QString ts = ti ? ti->text().trimmed() : QString();
        const QString ps = pi ? pi->text().trimmed() : QString();
        if (ts.isEmpty() && ps.isEmpty()) continue;  // blank rows are ignored
        double T = 0, P = 0;
        if (!parseNumber(ts, T))
            throw InputError(d.file, r + 1, "T", "'" + ts.toStdString() + "' is not a number");
        if (!parseNumber(ps, P))
            throw InputError(d.file, r + 1, "P", "'" + ps.toStdString() + "' is not a number");
        d.points.push_back({toKelvin(T, tu), toPascal(P, pu), 1.0, r + 1});
    }
    return d;
}

bool FitDialog::loadCsv(const QString &path) {
    try {
        setData(fit::readFitCsvFile(path.toStdString()));
        dataFile_ = path;
        if (name_->text().isEmpty()) name_->setText(QFileInfo(path).completeBaseName());
        return true;
    } catch (const std::exception &e) {
        showError(QString::fromStdString(e.what()));
        return false;
    }
}

bool FitDialog::pasteText(const QString &text) {
    const QStringList lines = text.split(QLatin1Char('\n'), Qt::SkipEmptyParts);
    std::vector<std::pair<QString, QString>> rows;
    int lineNo = 0;
    for (const QString &line : lines) {
        ++lineNo;
        const QStringList cells = line.trimmed().split(
            QRegularExpression(QStringLiteral("[\\t,; ]+")), Qt::SkipEmptyParts);
        double v = 0;
        if (cells.size() >= 2 && !parseNumber(cells[0], v) && rows.empty()) continue;  // header
        if (cells.size() < 2) {
            showError(tr("pasted text, line %1: expected two numbers (T and P)").arg(lineNo));
            return false;
        }
        rows.emplace_back(cells[0], cells[1]);
    }
    table_->setRowCount(static_cast<int>(rows.size()));
    for (std::size_t i = 0; i < rows.size(); ++i) {
        table_->setItem(static_cast<int>(i), 0, new QTableWidgetItem(rows[i].first));
        table_->setItem(static_cast<int>(i), 1, new QTableWidgetItem(rows[i].second));
    }
    dataFile_ = QStringLiteral("pasted data");
    return true;
}

void FitDialog::setBoundary(BoundaryKind kind, const QString &model) {
    for (std::size_t i = 0; i < kKinds.size(); ++i)
        if (kKinds[i] == kind) kind_->setCurrentIndex(static_cast<int>(i));
    model_->setCurrentText(model);
}

void FitDialog::setReference(double T_K, double P_Pa) {
    refT_->setText(g(T_K, 10));
    refP_->setText(g(P_Pa, 10));
}

void FitDialog::setSubstanceName(const QString &name) { name_->setText(name); }

fit::FitRequest FitDialog::request() const {
    fit::FitRequest req;
    req.kind = kKinds.at(static_cast<std::size_t>(kind_->currentIndex()));
    req.model = model_->currentText().toStdString();
    req.exponents = exponents_->isEnabled() ? exponents_->text().trimmed().toStdString() : "";
    const QString m = model_->currentText();
    if (needsCritical(m) || needsTriple(m)) {
        double T = 0, P = 0;
        if (!parseNumber(refT_->text(), T) || !parseNumber(refP_->text(), P))
            throw Error("enter the reference temperature (K) and pressure (Pa) for " + req.model);
        (needsCritical(m) ? req.Tc_K : req.Tt_K) = T;
        (needsCritical(m) ? req.Pc_Pa : req.Pt_Pa) = P;
    }
    return req;
}

bool FitDialog::fit() {
    result_.reset();
    request_.reset();
    saveButton_->setEnabled(false);
    try {
        const fit::FitRequest req = request();
        result_ = fit::fitBoundary(data(), req);
        request_ = req;
    } catch (const std::exception &e) {
        showError(QString::fromStdString(e.what()));
        return false;
    }
    showResult();
    plotResult();
    saveButton_->setEnabled(true);
    return true;
}

void FitDialog::showResult() {
    const fit::FitResult &r = *result_;
    QString html = tr("<h3>%1 fit of the %2 boundary</h3><table>")
                       .arg(QString::fromStdString(r.spec.form),
                            QString::fromStdString(std::string(toString(r.kind))));
    for (const fit::FitParameter &p : r.parameters)
        html += QStringLiteral("<tr><td><b>%1</b></td><td>%2</td><td>± %3</td><td>%4</td></tr>")
                    .arg(QString::fromStdString(p.name), g(p.value, 10), g(p.stdError, 3),
                         QString::fromStdString(p.unit));
    html += QStringLiteral("</table><p>");
    html += tr("%1 points, %2 degrees of freedom; RMS %3 %, max %4 % (%5 Pa); "
               "leave-one-out RMS %6 %; condition number %7; valid %8–%9 K")
                .arg(r.points)
                .arg(r.degreesOfFreedom)
                .arg(g(r.rms_pct, 3), g(r.maxAbs_pct, 3), g(r.maxAbs_Pa, 3), g(r.looRms_pct, 3),
                     g(r.conditionNumber, 3), g(r.validity.min_K, 6), g(r.validity.max_K, 6));
    if (r.dH_J_mol)
        html += tr("<br>ΔH = R·B = %1 ± %2 kJ/mol")
                    .arg(g(*r.dH_J_mol / 1000, 5), g(r.dHStdError_J_mol.value_or(kNaN) / 1000, 2));
    html += QStringLiteral("</p>");
    for (const std::string &w : r.warnings)
        html += QStringLiteral("<p style='color:#b0203a'>⚠ %1</p>")
                    .arg(QString::fromStdString(w).toHtmlEscaped());
    results_->setHtml(html);
}

void FitDialog::plotResult() {
    const fit::FitResult &r = *result_;
    QVector<double> T, dev, loo, P;
    for (const fit::FitResidual &x : r.residuals) {
        T.push_back(x.T_K);
        dev.push_back(x.dev_pct);
        loo.push_back(std::isfinite(x.loo_pct) ? x.loo_pct : qQNaN());
        P.push_back(x.P_Pa);
    }
    residualPlot_->clearGraphs();
    auto *gd = residualPlot_->addGraph();
    gd->setData(T, dev);
    gd->setLineStyle(QCPGraph::lsImpulse);
    gd->setScatterStyle(QCPScatterStyle(QCPScatterStyle::ssDisc, QColor(0x1f, 0x5f, 0xa8), 6));
    gd->setPen(QPen(QColor(0x1f, 0x5f, 0xa8)));
    gd->setName(tr("fit"));
    auto *gl = residualPlot_->addGraph();
    gl->setData(T, loo);
    gl->setLineStyle(QCPGraph::lsNone);
    gl->setScatterStyle(QCPScatterStyle(QCPScatterStyle::ssCross, QColor(0xc0, 0x39, 0x2b), 7));
    gl->setName(tr("leave-one-out"));
    residualPlot_->legend->setVisible(true);
    residualPlot_->rescaleAxes();
    residualPlot_->replot();

    curvePlot_->clearGraphs();
    auto *pts = curvePlot_->addGraph();
    pts->setData(T, P);
    pts->setLineStyle(QCPGraph::lsNone);
    pts->setScatterStyle(QCPScatterStyle(QCPScatterStyle::ssCircle, QColor(0x20, 0x20, 0x28), 7));
    pts->setName(tr("data"));
    auto *curve = curvePlot_->addGraph();
    const double lo = r.validity.min_K, hi = r.validity.max_K;
    const double pad = 0.05 * (hi - lo);
    for (int i = 0; i <= 200; ++i) {
        const double t = lo - pad + (hi - lo + 2 * pad) * i / 200.0;
        const double p = r.pressure(t);
        if (std::isfinite(p) && p > 0) curve->addData(t, p);
    }
    curve->setPen(QPen(QColor(0xb8, 0x5c, 0x00), 2));
    curve->setName(tr("fitted"));
    curvePlot_->legend->setVisible(true);
    curvePlot_->rescaleAxes();
    curvePlot_->replot();
}

void FitDialog::showError(const QString &message) {
    results_->setHtml(
        QStringLiteral("<p style='color:#b0203a'>%1</p>").arg(message.toHtmlEscaped()));
}

QString FitDialog::saveToLibrary() {
    if (!result_ || !request_) return {};
    try {
        const std::string name = name_->text().trimmed().isEmpty()
                                     ? "my substance"
                                     : name_->text().trimmed().toStdString();
        fit::FitProvenance prov{dataFile_.toStdString(), fit::today()};
        const Substance s = fit::substanceFromFit(*result_, *request_, name, prov);
        QDir().mkpath(userFolder_);
        const QString path =
            QDir(userFolder_).filePath(QString::fromStdString(fit::substanceId(name)) + ".json");
        const auto warnings = fit::writeSubstanceChecked(s, path.toStdString());
        QString note = tr("Saved %1").arg(path);
        for (const auto &w : warnings) note += QStringLiteral("\n") + QString::fromStdString(w);
        results_->append(note.toHtmlEscaped());
        emit substanceSaved(path);
        return path;
    } catch (const std::exception &e) {
        showError(QString::fromStdString(e.what()));
        return {};
    }
}

}  // namespace pw::ui
