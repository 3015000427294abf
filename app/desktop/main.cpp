// phasewright: the desktop phase-diagram explorer.
//   phasewright [--demo] [FILE...]   FILE: a session (.pwsession), points (.csv) or substance
//   (.json)
#include <QApplication>
#include <QCommandLineParser>
#include <QElapsedTimer>
#include <QEvent>
#include <QIcon>
#include <QSettings>
#include <QTimer>
#include <cstdio>

#include <qcustomplot.h>
#include "core/errors.h"
#include "core/library.h"

#include "widgets/diagram_widget.h"
#include "widgets/main_window.h"
#include "widgets/session_controller.h"
#include "widgets/settings.h"

namespace {

// For the start-up benchmark: report the time from process start to the diagram's first
// paint on stdout, then quit.
class FirstPaintProbe : public QObject {
public:
    explicit FirstPaintProbe(const QElapsedTimer &clock) : clock_(clock) {}
    bool eventFilter(QObject *watched, QEvent *event) override {
        if (event->type() == QEvent::Paint && !done_) {
            done_ = true;
            QTimer::singleShot(0, qApp, [this] {
                std::printf("first_paint_ms %.1f\n",
                            static_cast<double>(clock_.nsecsElapsed()) / 1e6);
                std::fflush(stdout);
                QApplication::quit();
            });
        }
        return QObject::eventFilter(watched, event);
    }

private:
    const QElapsedTimer &clock_;
    bool done_ = false;
};

pw::SubstanceLibrary loadLibrary() {
    try {
        return pw::SubstanceLibrary::withUserFolder(pw::SubstanceLibrary::defaultUserFolder());
    } catch (const pw::Error &e) {
        std::fprintf(stderr, "phasewright: user substance folder ignored: %s\n", e.what());
        return pw::SubstanceLibrary::bundled();
    }
}

// Documentation screenshots: open the files (or the demo), show the window at a fixed size,
// let the diagram settle, save the window's picture and quit.
int screenshot(pw::ui::MainWindow &window, const QStringList &files, bool demo,
               const QString &out) {
    if (demo) window.loadDemo();
    for (const QString &f : files) {
        QString error;
        if (!window.openPath(f, &error)) {
            std::fprintf(stderr, "phasewright: %s\n", qPrintable(error));
            return 1;
        }
    }
    window.resize(1440, 900);
    window.show();
    QTimer::singleShot(600, &window, [&window, out] {
        window.diagram()->rebuild();
        const auto &points = window.document().points();
        if (!points.empty()) window.showCursorState(points.back().T_K, points.back().P_Pa);
        const bool ok = window.grab().save(out);
        std::fprintf(ok ? stdout : stderr, "%s %s\n", ok ? "saved" : "cannot save",
                     qPrintable(out));
        QApplication::exit(ok ? 0 : 1);
    });
    return QApplication::exec();
}

}  // namespace

int main(int argc, char **argv) {
    QElapsedTimer clock;
    clock.start();
    QGuiApplication::setHighDpiScaleFactorRoundingPolicy(
        Qt::HighDpiScaleFactorRoundingPolicy::PassThrough);
    QApplication app(argc, argv);
    QApplication::setApplicationName(QStringLiteral("Phasewright"));
    QApplication::setOrganizationName(QStringLiteral("Phasewright"));
    QApplication::setOrganizationDomain(QStringLiteral("phasewright.org"));
    QApplication::setApplicationVersion(QStringLiteral(PW_VERSION));
    QApplication::setWindowIcon(QIcon(QStringLiteral(":/icons/phasewright.svg")));
    QGuiApplication::setDesktopFileName(QStringLiteral("org.phasewright.Phasewright"));

    QCommandLineParser parser;
    parser.setApplicationDescription(
        QStringLiteral("Phase-diagram explorer and state-point classifier"));
    parser.addHelpOption();
    parser.addVersionOption();
    const QCommandLineOption demo(QStringLiteral("demo"), QStringLiteral("Open the bundled demo"));
    QCommandLineOption probe(QStringLiteral("quit-after-first-paint"),
                             QStringLiteral("Print the start-up time to the first paint and quit"));
    probe.setFlags(QCommandLineOption::HiddenFromHelp);
    QCommandLineOption shot(QStringLiteral("screenshot"),
                            QStringLiteral("Save a picture of the window to FILE and quit"),
                            QStringLiteral("FILE"));
    parser.addOption(demo);
    parser.addOption(probe);
    parser.addOption(shot);
    parser.addPositionalArgument(QStringLiteral("files"),
                                 QStringLiteral("Session, points (CSV) or substance files"),
                                 QStringLiteral("[FILE...]"));
    parser.process(app);

    QSettings store;
    pw::ui::Settings settings(store);
    pw::SubstanceLibrary library = loadLibrary();
    pw::ui::MainWindow window(settings, library, pw::ui::SessionController::defaultRecoveryPath());
    FirstPaintProbe paintProbe(clock);
    if (parser.isSet(probe)) {
        window.diagram()->plot()->installEventFilter(&paintProbe);
        if (parser.isSet(demo)) window.loadDemo();
        window.show();
        return QApplication::exec();
    }
    const QStringList files = parser.positionalArguments();
    const bool wantDemo = parser.isSet(demo);
    if (parser.isSet(shot)) return screenshot(window, files, wantDemo, parser.value(shot));
    window.show();
    QTimer::singleShot(0, &window, [&window, files, wantDemo] {
        window.showCautionIfFirstRun();
        if (window.offerRecovery()) return;
        if (wantDemo) window.loadDemo();
        for (const QString &f : files) {
            QString error;
            if (!window.openPath(f, &error))
                std::fprintf(stderr, "phasewright: %s\n", qPrintable(error));
        }
    });
    return QApplication::exec();
}
