#pragma once
// Import a logged run: choose the file, check or change the time, temperature and pressure
// columns and units (guessed from the header by run::previewRunLog), look at the first rows,
// then import on a worker thread with a progress bar and Cancel. Emits imported() with the
// analysed run; a cancelled or failed import delivers nothing.
#include <QDialog>
#include <memory>

#include "core/run/run_log.h"
#include "widgets/document.h"
#include "widgets/runs/run_data.h"

class QCheckBox;
class QComboBox;
class QDialogButtonBox;
class QLabel;
class QLineEdit;
class QProgressBar;
class QPushButton;
class QTableWidget;

namespace pw::ui {

class RunImportDialog : public QDialog {
    Q_OBJECT
public:
    explicit RunImportDialog(DiagramPtr diagram, QWidget *parent = nullptr);
    ~RunImportDialog() override;

    // Reads the header and first rows of `path` and fills the choices; false (message shown
    // in the dialog) when the file cannot be previewed.
    bool setPath(const QString &path);
    // The options the import will use (what the dialog shows).
    run::RunLogOptions options() const;
    // Starts the worker; returns it (tests wait on it). Null when nothing can be imported.
    RunImportJob *startImport();
    RunImportJob *job() const { return job_.get(); }
    QTableWidget *previewTable() const { return preview_; }
    QComboBox *timeColumn() const { return timeColumn_; }
    QComboBox *temperatureColumn() const { return tColumn_; }
    QComboBox *pressureColumn() const { return pColumn_; }
    QLabel *status() const { return status_; }

signals:
    void imported(pw::ui::RunPtr run);

public slots:
    void reject() override;  // cancels a running import first

private:
    void browse();
    void setBusy(bool busy);
    void onFinished(const RunPtr &run);

    DiagramPtr diagram_;
    QLineEdit *path_;
    QComboBox *timeColumn_, *tColumn_, *pColumn_, *tUnit_, *pUnit_, *timeUnit_;
    QCheckBox *gauge_;
    QTableWidget *preview_;
    QLabel *notes_;
    QLabel *status_;
    QProgressBar *progress_;
    QPushButton *importButton_;
    QPushButton *cancelButton_;
    std::unique_ptr<RunImportJob> job_;
};

}  // namespace pw::ui
