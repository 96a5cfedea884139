#pragma once
// What the `mendwright` executable does, as a library so that the end-to-end test and the
// screenshot script start the very same program: read the command line, open the workspace,
// load the QML module's main window.

#include <QQmlApplicationEngine>
#include <QStringList>
#include <memory>
#include <optional>
#include <string>

#include "app/desktop/workspace.hpp"

namespace mendwright::desktop {

struct LaunchOptions {
    DesktopOptions desktop;
    std::string grab_folder;  // --grab DIR: render every main view to DIR/*.png and quit
    bool first_frame = false;  // --first-frame: print "first-frame" once the first frame is shown, and quit (benchmark)
    bool help = false;
};

// `arguments` without the program name. Nothing on success; the usage error otherwise.
std::optional<std::string> parse_launch_options(const QStringList& arguments, LaunchOptions& options);
std::string launch_usage();

// Sets the organisation and application names (settings, data folder) once, before anything.
void set_application_identity();

// Loads qrc:/Mendwright/Main.qml; false when it did not load (the engine printed why).
bool load_main_window(QQmlApplicationEngine& engine);

}  // namespace mendwright::desktop
