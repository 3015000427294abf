#pragma once
// Saving, opening, autosave and crash recovery of the Document. Saves are atomic (QSaveFile).
// While the session has unsaved changes, a recovery file is written every
// Settings::autosaveSeconds(); it is removed after a save, a clean close or an explicit
// discard, so a recovery file found at start means the last run ended without cleaning up.
#include <QObject>
#include <QString>
#include <QTimer>

#include "core/library.h"
#include "widgets/document.h"
#include "widgets/session_io.h"
#include "widgets/settings.h"

namespace pw::ui {

class SessionController : public QObject {
    Q_OBJECT
public:
    // `recoveryPath`: where the recovery file lives (tests pass a temporary path).
    SessionController(Document &doc, Settings &settings, SubstanceLibrary &library,
                      QString recoveryPath, QObject *parent = nullptr);
    ~SessionController() override;

    static QString defaultRecoveryPath();

    QString currentFile() const { return currentFile_; }
    // The document's content (plus units from the settings) as a SessionData, and back.
    SessionData snapshot() const;
    // Throws pw::Error when a substance cannot be found; the document is untouched then.
    void apply(const SessionData &data);

    bool save(const QString &path, QString *error);
    bool open(const QString &path, QString *error);
    void newSession(DiagramPtr substance);

    bool hasRecovery() const;
    QString recoveryPath() const { return recoveryPath_; }
    bool recover(QString *error);  // loads the recovery file; the session stays modified
    void discardRecovery();
    bool writeRecovery();  // the autosave step (no-op while clean)
    // Call on a normal exit: removes the recovery file.
    void closeCleanly();

    // Resolve one substance reference: library by id, else the origin file.
    DiagramPtr resolve(const SessionData::SubstanceRef &ref) const;

signals:
    void currentFileChanged(const QString &path);
    void message(const QString &text);

private:
    void setCurrentFile(const QString &path);
    void restartAutosave();

    Document &doc_;
    Settings &settings_;
    SubstanceLibrary &library_;
    QString recoveryPath_;
    QString currentFile_;
    QTimer autosave_;
    bool dirtySinceAutosave_ = false;
};

}  // namespace pw::ui
