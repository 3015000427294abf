#pragma once
// Shared set-up for the widget tests: one QApplication for the process (created lazily,
// because GTest::gtest_main owns main()), a temporary folder, settings in an INI file inside
// it, and the bundled substance library. QT_QPA_PLATFORM=offscreen comes from CTest.
#include <gtest/gtest.h>

#include <QApplication>
#include <QSettings>
#include <QTemporaryDir>
#include <memory>
#include <ostream>

#include "core/library.h"
#include "widgets/settings.h"

// Readable QString values in GoogleTest failure messages.
inline void PrintTo(const QString &s, std::ostream *os) { *os << '"' << s.toStdString() << '"'; }

namespace pw::ui::test {

inline QApplication &guiApp() {
    static int argc = 1;
    static char name[] = "widgets_tests";
    static char *argv[] = {name, nullptr};
    static auto *app = new QApplication(argc, argv);  // lives until the process exits
    return *app;
}

class GuiTest : public ::testing::Test {
protected:
    void SetUp() override {
        guiApp();
        ASSERT_TRUE(dir_.isValid());
        store_ = std::make_unique<QSettings>(dir_.filePath(QStringLiteral("settings.ini")),
                                             QSettings::IniFormat);
        settings_ = std::make_unique<Settings>(*store_);
        settings_->setAutosaveSeconds(0);  // tests drive autosave by hand
    }
    QString path(const char *name) const { return dir_.filePath(QString::fromUtf8(name)); }

    QTemporaryDir dir_;
    std::unique_ptr<QSettings> store_;
    std::unique_ptr<Settings> settings_;
    SubstanceLibrary library_ = SubstanceLibrary::bundled();
};

}  // namespace pw::ui::test
