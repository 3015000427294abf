// phasewright: the desktop phase-diagram explorer.
#include <QApplication>
#include <QIcon>
#include <QLabel>

int main(int argc, char **argv) {
    QApplication app(argc, argv);
    QApplication::setApplicationName(QStringLiteral("Phasewright"));
    QApplication::setOrganizationName(QStringLiteral("Phasewright"));
    QApplication::setApplicationVersion(QStringLiteral(PW_VERSION));
    QApplication::setWindowIcon(QIcon(QStringLiteral(":/icons/phasewright.svg")));
    QLabel placeholder(QStringLiteral("Phasewright"));
    placeholder.show();
    return QApplication::exec();
}
