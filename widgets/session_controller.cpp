#include "widgets/session_controller.h"

#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QStandardPaths>

#include "core/errors.h"
#include "core/substance_io.h"

namespace pw::ui {

SessionController::SessionController(Document &doc, Settings &settings, SubstanceLibrary &library,
                                     QString recoveryPath, QObject *parent)
    : QObject(parent),
      doc_(doc),
      settings_(settings),
      library_(library),
      recoveryPath_(std::move(recoveryPath)) {
    autosave_.setSingleShot(false);
    connect(&autosave_, &QTimer::timeout, this, [this] { writeRecovery(); });
    connect(&settings_, &Settings::autosaveSecondsChanged, this, [this] { restartAutosave(); });
    connect(&doc_.undoStack(), &QUndoStack::indexChanged, this,
            [this] { dirtySinceAutosave_ = true; });
    connect(&doc_.undoStack(), &QUndoStack::cleanChanged, this, [this](bool clean) {
        if (clean) discardRecovery();
    });
    restartAutosave();
}

SessionController::~SessionController() = default;

QString SessionController::defaultRecoveryPath() {
    const QString dir = QStandardPaths::writableLocation(QStandardPaths::AppDataLocation);
    return QDir(dir).filePath(QStringLiteral("recovery.") + QLatin1String(kSessionSuffix));
}

void SessionController::restartAutosave() {
    autosave_.stop();
    if (settings_.autosaveSeconds() > 0) autosave_.start(settings_.autosaveSeconds() * 1000);
}

SessionData SessionController::snapshot() const {
    SessionData s;
    for (const auto &d : doc_.substances())
        s.substances.push_back({QString::fromStdString(d->substance().id),
                                QString::fromStdString(d->substance().origin)});
    s.points = doc_.points();
    s.view = doc_.view();
    s.units = settings_.units();
    s.showAtmosphere = settings_.showAtmosphere();
    return s;
}

DiagramPtr SessionController::resolve(const SessionData::SubstanceRef &ref) const {
    try {
        return library_.find(ref.id.toStdString());
    } catch (const pw::Error &) {
        if (ref.origin.isEmpty() || ref.origin.startsWith(QLatin1String("bundled:"))) throw;
    }
    return library_.find(ref.origin.toStdString());  // a substance file outside the library
}

void SessionController::apply(const SessionData &data) {
    std::vector<DiagramPtr> substances;
    for (const auto &ref : data.substances) substances.push_back(resolve(ref));
    settings_.setUnits(data.units);
    settings_.setShowAtmosphere(data.showAtmosphere);
    settings_.setLogPressure(data.view.logPressure);
    doc_.undoStack().clear();
    doc_.setSubstances(std::move(substances));
    doc_.resetPoints(data.points);
    if (data.view.valid()) doc_.setView(data.view);
}

void SessionController::setCurrentFile(const QString &path) {
    currentFile_ = path;
    emit currentFileChanged(path);
}

bool SessionController::save(const QString &path, QString *error) {
    if (!writeFileAtomically(path, sessionToJson(snapshot()), error)) return false;
    setCurrentFile(path);
    settings_.addRecentFile(path);
    doc_.undoStack().setClean();
    discardRecovery();
    emit message(tr("Saved %1").arg(QFileInfo(path).fileName()));
    return true;
}

bool SessionController::open(const QString &path, QString *error) {
    QFile file(path);
    if (!file.open(QIODevice::ReadOnly)) {
        if (error) *error = tr("%1: cannot open: %2").arg(path, file.errorString());
        return false;
    }
    try {
        apply(sessionFromJson(file.readAll(), path));
    } catch (const pw::Error &e) {
        if (error) *error = QString::fromUtf8(e.what());
        return false;
    }
    doc_.undoStack().setClean();
    setCurrentFile(path);
    settings_.addRecentFile(path);
    emit message(tr("Opened %1").arg(QFileInfo(path).fileName()));
    return true;
}

void SessionController::newSession(DiagramPtr substance) {
    doc_.undoStack().clear();
    doc_.resetPoints({});
    if (substance) doc_.setSubstances({std::move(substance)});
    setCurrentFile(QString());
    discardRecovery();
}

bool SessionController::hasRecovery() const { return QFileInfo::exists(recoveryPath_); }

bool SessionController::recover(QString *error) {
    QFile file(recoveryPath_);
    if (!file.open(QIODevice::ReadOnly)) {
        if (error) *error = tr("%1: cannot open: %2").arg(recoveryPath_, file.errorString());
        return false;
    }
    SessionData data;
    try {
        data = sessionFromJson(file.readAll(), recoveryPath_);
        apply(data);
    } catch (const pw::Error &e) {
        if (error) *error = QString::fromUtf8(e.what());
        return false;
    }
    setCurrentFile(data.recoveredFrom);
    // The recovered content is not saved anywhere the user chose: keep it marked modified.
    doc_.undoStack().resetClean();
    dirtySinceAutosave_ = true;
    emit message(tr("Recovered the unsaved session"));
    return true;
}

void SessionController::discardRecovery() {
    if (QFileInfo::exists(recoveryPath_)) QFile::remove(recoveryPath_);
    dirtySinceAutosave_ = false;
}

bool SessionController::writeRecovery() {
    if (doc_.undoStack().isClean() || !dirtySinceAutosave_) return false;
    SessionData s = snapshot();
    s.recoveredFrom = currentFile_.isNull() ? QStringLiteral("") : currentFile_;
    QDir().mkpath(QFileInfo(recoveryPath_).absolutePath());
    QString error;
    if (!writeFileAtomically(recoveryPath_, sessionToJson(s), &error)) {
        emit message(tr("Autosave failed: %1").arg(error));
        return false;
    }
    dirtySinceAutosave_ = false;
    return true;
}

void SessionController::closeCleanly() {
    autosave_.stop();
    discardRecovery();
}

}  // namespace pw::ui
