// Sessions: save and reopen with equal content, atomic saves, the modified mark, autosave to a
// recovery file and the offer to recover it after a crash.
#include <QDir>
#include <QFile>
#include <QMessageBox>
#include <QPushButton>
#include <QTimer>

#include "core/errors.h"
#include "gui_fixture.h"
#include "widgets/commands.h"
#include "widgets/main_window.h"
#include "widgets/session_controller.h"
#include "widgets/session_io.h"

namespace pw::ui::test {
namespace {

class SessionTest : public GuiTest {
protected:
    void fill(Document &doc) {
        edit::setSubstances(doc, {library_.find("carbon-dioxide")});
        edit::addPoint(doc, {QStringLiteral("liquid fill"), 288.15, 6e6});
        edit::addPoint(doc, {QStringLiteral("dry, 40 °C"), 313.15, 1e7});
        doc.setView({200.0, 330.0, 1e4, 1e8, true});
        settings_->setUnits({TemperatureUnit::Celsius, PressureUnit::MPa});
    }
};

TEST_F(SessionTest, SavedSessionReopensWithEqualContent) {
    Document doc;
    SessionController controller(doc, *settings_, library_, path("recovery.pwsession"));
    fill(doc);
    const SessionData before = controller.snapshot();
    QString error;
    ASSERT_TRUE(controller.save(path("run.pwsession"), &error)) << error.toStdString();
    EXPECT_TRUE(doc.undoStack().isClean());
    EXPECT_EQ(settings_->recentFiles().value(0), QDir(dir_.path()).filePath("run.pwsession"));

    settings_->setUnits({TemperatureUnit::Kelvin, PressureUnit::Pa});
    Document other;
    SessionController reader(other, *settings_, library_, path("recovery2.pwsession"));
    ASSERT_TRUE(reader.open(path("run.pwsession"), &error)) << error.toStdString();
    EXPECT_EQ(reader.snapshot(), before);
    ASSERT_EQ(other.pointCount(), 2);
    EXPECT_EQ(other.point(1).label, QStringLiteral("dry, 40 °C"));
    EXPECT_EQ(other.primary()->substance().id, "carbon-dioxide");
    EXPECT_EQ(settings_->units().temperature, TemperatureUnit::Celsius);
    EXPECT_TRUE(other.undoStack().isClean());
    // QSaveFile leaves only the file itself behind.
    EXPECT_EQ(QDir(dir_.path()).entryList({QStringLiteral("run*")}, QDir::Files).size(), 1);
}

TEST_F(SessionTest, BadSessionFileIsRefusedWithTheFieldNamedAndTheDocumentUntouched) {
    QFile f(path("bad.pwsession"));
    ASSERT_TRUE(f.open(QIODevice::WriteOnly));
    SessionData s;
    s.substances.push_back({QStringLiteral("water"), QString()});
    s.view = {200, 400, 1, 1e6, true};
    s.points.push_back({QStringLiteral("x"), 300.0, 1e5});
    QByteArray json = sessionToJson(s);
    json.replace("\"T_K\": 300", "\"T_K\": \"hot\"");
    f.write(json);
    f.close();
    Document doc;
    SessionController controller(doc, *settings_, library_, path("recovery.pwsession"));
    QString error;
    EXPECT_FALSE(controller.open(path("bad.pwsession"), &error));
    EXPECT_TRUE(error.contains(QStringLiteral("bad.pwsession"))) << error.toStdString();
    EXPECT_TRUE(error.contains(QStringLiteral("/points/0/T_K"))) << error.toStdString();
    EXPECT_EQ(doc.pointCount(), 0);
}

TEST_F(SessionTest, AutosaveWritesARecoveryFileOnlyWhileModified) {
    Document doc;
    SessionController controller(doc, *settings_, library_, path("recovery.pwsession"));
    EXPECT_FALSE(controller.writeRecovery());  // clean: nothing to recover
    fill(doc);
    EXPECT_TRUE(controller.writeRecovery());
    EXPECT_TRUE(controller.hasRecovery());
    QString error;
    ASSERT_TRUE(controller.save(path("saved.pwsession"), &error));
    EXPECT_FALSE(controller.hasRecovery());  // saved: the recovery file is gone
    edit::addPoint(doc, {QStringLiteral("more"), 250.0, 1e5});
    EXPECT_TRUE(controller.writeRecovery());
    controller.closeCleanly();
    EXPECT_FALSE(controller.hasRecovery());
}

TEST_F(SessionTest, RecoveryIsOfferedAndRestoredAfterACrash) {
    const QString recovery = path("recovery.pwsession");
    SessionData lost;
    {
        // The "crashed" run: edits autosaved, then the process dies without closing cleanly.
        Document doc;
        SessionController crashed(doc, *settings_, library_, recovery);
        fill(doc);
        ASSERT_TRUE(crashed.writeRecovery());
        lost = crashed.snapshot();
    }
    ASSERT_TRUE(QFile::exists(recovery));

    MainWindow window(*settings_, library_, recovery);
    EXPECT_TRUE(window.session().hasRecovery());
    bool offered = false;
    QTimer::singleShot(0, &window, [&offered] {  // answer the question the window asks
        auto *box = qobject_cast<QMessageBox *>(QApplication::activeModalWidget());
        if (!box) return;
        offered = true;
        box->button(QMessageBox::Yes)->click();
    });
    EXPECT_TRUE(window.offerRecovery());
    EXPECT_TRUE(offered);
    EXPECT_EQ(window.session().snapshot().points, lost.points);
    EXPECT_EQ(window.document().primary()->substance().id, "carbon-dioxide");
    EXPECT_TRUE(window.isWindowModified());  // recovered work is not saved anywhere yet
}

}  // namespace
}  // namespace pw::ui::test
