#pragma once
// Renders the main views of the running window to PNG files (docs/screenshots): asks the main
// window to show each view in turn (its `showView(name)` function, the same one its keyboard
// shortcuts call), lets it draw, and grabs the frame.

#include <QQuickWindow>
#include <QStringList>

namespace mendwright::desktop {

// The views, in the order the main path visits them; file names are "<n>-<view>.png".
QStringList main_view_names();

// Grabs every view of main_view_names() into `folder`; the files written, or an empty list.
QStringList grab_main_views(QQuickWindow& window, const QString& folder);

}  // namespace mendwright::desktop
