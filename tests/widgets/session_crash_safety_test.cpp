// Crash safety of sessions with real process deaths (SIGKILL, no destructor runs):
// 1. a process killed while it saves leaves the session file either as it was or as the
//    complete new version, never a partial file (QSaveFile commit, widgets/session_io.h);
// 2. autosave then a kill: the recovery file is found at the next start and restores the work.
// The children do no Qt event processing; they only build documents and write files.
#include <gtest/gtest.h>
#include <signal.h>
#include <sys/wait.h>
#include <unistd.h>

#include <QDir>
#include <QFile>
#include <QSettings>
#include <QTemporaryDir>
#include <chrono>
#include <cstdio>
#include <memory>
#include <thread>

#include "core/errors.h"
#include "core/library.h"
#include "widgets/commands.h"
#include "widgets/document.h"
#include "widgets/session_controller.h"
#include "widgets/session_io.h"
#include "widgets/settings.h"

namespace pw::ui {
namespace {

// A document with one substance and `n` numbered points; large enough that a save takes a
// while (each point is one JSON object).
struct World {
    explicit World(const QString &dir)
        : store(dir + QStringLiteral("/settings.ini"), QSettings::IniFormat), settings(store) {
        settings.setAutosaveSeconds(0);
    }
    void fill(int n) {
        edit::setSubstances(doc, {library.find("carbon-dioxide")});
        std::vector<StatePoint> points;
        for (int i = 0; i < n; ++i)
            points.push_back({QStringLiteral("p%1").arg(i), 250.0 + 0.001 * i, 1e5 + i});
        edit::addPoints(doc, std::move(points), QStringLiteral("fill"));
    }
    QSettings store;
    Settings settings;
    SubstanceLibrary library = SubstanceLibrary::bundled();
    Document doc;
};

// The session file is complete: it reads, and its points are p0..p(n-1) with nothing missing.
int completePoints(const QString &file) {
    QFile f(file);
    if (!f.open(QIODevice::ReadOnly)) return -1;
    const SessionData s = sessionFromJson(f.readAll(), file);  // throws on a torn file
    for (std::size_t i = 0; i < s.points.size(); ++i)
        if (s.points[i].label != QStringLiteral("p%1").arg(i)) return -2;
    return static_cast<int>(s.points.size());
}

TEST(SessionCrashSafety, KillDuringSaveLeavesThePreviousOrTheNewFileIntact) {
    QTemporaryDir dir;
    ASSERT_TRUE(dir.isValid());
    const QString file = dir.filePath(QStringLiteral("run.pwsession"));
    {
        World w(dir.path());
        w.fill(2000);
        SessionController c(w.doc, w.settings, w.library, dir.filePath(QStringLiteral("r")));
        QString error;
        ASSERT_TRUE(c.save(file, &error)) << error.toStdString();
    }
    ASSERT_EQ(completePoints(file), 2000);
    int tornWrites = 0;  // rounds where the kill left a QSaveFile temporary: mid-write
    for (int round = 0; round < 12; ++round) {
        int ready[2];
        ASSERT_EQ(pipe(ready), 0);
        const pid_t child = fork();
        ASSERT_GE(child, 0);
        if (child == 0) {
            // Saves bigger and bigger versions as fast as it can until killed; tells the
            // parent once the first one is complete.
            close(ready[0]);
            World w(dir.path());
            const int base = 2000 + round * 50;
            w.fill(base);
            SessionController c(w.doc, w.settings, w.library, dir.filePath(QStringLiteral("r")));
            for (int i = 0;; ++i) {
                edit::addPoint(w.doc, {QStringLiteral("p%1").arg(base + i), 300, 1});
                QString error;
                if (!c.save(file, &error)) _exit(3);
                if (i == 0 && write(ready[1], "1", 1) != 1) _exit(4);
            }
        }
        close(ready[1]);
        char byte = 0;
        ASSERT_EQ(read(ready[0], &byte, 1), 1) << "the child never completed a save";
        close(ready[0]);
        std::this_thread::sleep_for(std::chrono::milliseconds(3 * round));
        ASSERT_EQ(kill(child, SIGKILL), 0);
        int status = 0;
        ASSERT_EQ(waitpid(child, &status, 0), child);
        ASSERT_TRUE(WIFSIGNALED(status)) << "the saving child stopped on its own: " << status;
        // The file is whole: one of the versions, never a torn one.
        int points = 0;
        ASSERT_NO_THROW(points = completePoints(file)) << "round " << round;
        EXPECT_GT(points, 2000 + round * 50) << "round " << round;
        const QStringList temps = QDir(dir.path()).entryList({QStringLiteral("run.pwsession.*")});
        if (!temps.isEmpty()) ++tornWrites;
        for (const QString &t : temps) QFile::remove(dir.filePath(t));
    }
    // Informative: how often the kill landed inside a write (the file was whole every time).
    std::printf("kills during a write: %d of 12\n", tornWrites);
}

TEST(SessionCrashSafety, AutosaveSurvivesAKillAndIsRecoveredAtTheNextStart) {
    QTemporaryDir dir;
    ASSERT_TRUE(dir.isValid());
    const QString recovery = dir.filePath(QStringLiteral("recovery.pwsession"));
    const pid_t child = fork();
    ASSERT_GE(child, 0);
    if (child == 0) {
        World w(dir.path());
        SessionController c(w.doc, w.settings, w.library, recovery);
        w.fill(37);
        if (!c.writeRecovery()) _exit(3);
        raise(SIGKILL);  // dies with unsaved work: no clean close
        _exit(4);
    }
    int status = 0;
    ASSERT_EQ(waitpid(child, &status, 0), child);
    ASSERT_TRUE(WIFSIGNALED(status) && WTERMSIG(status) == SIGKILL) << status;

    World next(dir.path());
    SessionController c(next.doc, next.settings, next.library, recovery);
    ASSERT_TRUE(c.hasRecovery());
    QString error;
    ASSERT_TRUE(c.recover(&error)) << error.toStdString();
    const SessionData got = c.snapshot();
    ASSERT_EQ(got.points.size(), 37u);
    EXPECT_EQ(got.points[36].label, QStringLiteral("p36"));
    EXPECT_DOUBLE_EQ(got.points[36].T_K, 250.0 + 0.036);
    EXPECT_DOUBLE_EQ(got.points[36].P_Pa, 1e5 + 36);
    EXPECT_FALSE(next.doc.undoStack().isClean()) << "recovered work is not saved anywhere yet";
    // Saving it somewhere makes the recovery file go away.
    ASSERT_TRUE(c.save(dir.filePath(QStringLiteral("saved.pwsession")), &error));
    EXPECT_FALSE(c.hasRecovery());
    EXPECT_EQ(completePoints(dir.filePath(QStringLiteral("saved.pwsession"))), 37);
}

}  // namespace
}  // namespace pw::ui
