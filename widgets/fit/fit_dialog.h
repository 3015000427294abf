#pragma once
// Fit a phase boundary to the user's measurements (docs/fitting.md, core/fit): a data table
// (import a CSV or paste), the boundary kind and model, the reference point when the model
// needs one, then Fit: parameters with standard errors, statistics and warnings, a residual
// plot and the fitted curve over the data points. "Save to my library" writes a substance file
// (writeSubstanceChecked, atomic) into the user's substance folder.
#include <QDialog>
#include <optional>

#include "core/fit/fit.h"

class QComboBox;
class QCustomPlot;
class QLabel;
class QLineEdit;
class QPushButton;
class QTableWidget;
class QTextBrowser;

namespace pw::ui {

class FitDialog : public QDialog {
    Q_OBJECT
public:
    // `userFolder`: where "Save to my library" writes (SubstanceLibrary::defaultUserFolder()).
    explicit FitDialog(QString userFolder, QWidget *parent = nullptr);

    // Data as (T, P) in the units chosen in the table header combos.
    void setData(const fit::FitData &data);
    fit::FitData data() const;  // throws InputError naming the table row for a bad cell
    bool loadCsv(const QString &path);
    bool pasteText(const QString &text);  // tab/comma/blank separated "T P" rows

    void setBoundary(BoundaryKind kind, const QString &model);
    void setReference(double T_K, double P_Pa);  // Tc/Pc or Tt/Pt, whichever the model needs
    void setSubstanceName(const QString &name);

    bool fit();  // false: the message is in the results pane
    const std::optional<fit::FitResult> &result() const { return result_; }
    // Writes <userFolder>/<id>.json; returns the path, or empty with the message shown.
    QString saveToLibrary();

    QTableWidget *table() const { return table_; }
    QCustomPlot *residualPlot() const { return residualPlot_; }
    QCustomPlot *curvePlot() const { return curvePlot_; }
    QTextBrowser *resultsText() const { return results_; }

signals:
    // A substance file was written (the caller adds it to the library and the chooser).
    void substanceSaved(const QString &path);

private:
    QWidget *buildDataPane();
    QWidget *buildResultPane();
    void updateModels();
    void updateReferenceFields();
    fit::FitRequest request() const;
    void showResult();
    void plotResult();
    void showError(const QString &message);

    QString userFolder_;
    QString dataFile_;
    QTableWidget *table_;
    QComboBox *tUnit_, *pUnit_, *kind_, *model_;
    QLabel *refLabel_;
    QLineEdit *refT_, *refP_, *exponents_, *name_;
    QPushButton *fitButton_, *saveButton_;
    QTextBrowser *results_;
    QCustomPlot *residualPlot_, *curvePlot_;
    std::optional<fit::FitResult> result_;
    std::optional<fit::FitRequest> request_;
};

}  // namespace pw::ui
