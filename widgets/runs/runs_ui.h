#pragma once
// How the runs and fitting features plug into the main window, kept out of main_window.cpp:
// the Runs dock (run list, events, rules, plan editor), the Time chart dock, the Runs menu
// (import, the demo runs) and Tools > Fit Boundary….
class QMainWindow;

namespace pw {
class SubstanceLibrary;
}

namespace pw::ui {

class DiagramWidget;
class Document;
class RunsPanel;
class Settings;

RunsPanel *addRunsDocks(QMainWindow &window, DiagramWidget &diagram, Document &doc,
                        Settings &settings, const SubstanceLibrary &library);
// `library` receives the substances saved by the fitting dialog (then the chooser refreshes).
void addRunsMenus(QMainWindow &window, RunsPanel &panel, SubstanceLibrary &library);

}  // namespace pw::ui
