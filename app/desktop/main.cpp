// mendwright: the desktop application. Everything it does lives in the mendwright_desktop
// library (app/desktop) and the QML module (qml/); this file only starts them.
#include <QGuiApplication>
#include <QQmlApplicationEngine>
#include <QQuickWindow>
#include <QtQml/qqmlextensionplugin.h>
#include <iostream>

#include "app/desktop/application.hpp"
#include "app/desktop/view_grabber.hpp"

Q_IMPORT_QML_PLUGIN(Mendwright_ModelsPlugin)
Q_IMPORT_QML_PLUGIN(MendwrightPlugin)

int main(int argc, char* argv[]) {
    QGuiApplication app(argc, argv);
    mendwright::desktop::set_application_identity();

    mendwright::desktop::LaunchOptions options;
    if (auto usage = mendwright::desktop::parse_launch_options(app.arguments().mid(1), options)) {
        std::cerr << "mendwright: " << *usage << "\n" << mendwright::desktop::launch_usage();
        return 2;
    }
    if (options.help) {
        std::cout << mendwright::desktop::launch_usage();
        return 0;
    }
    std::string error;
    auto workspace = mendwright::desktop::Workspace::open(options.desktop, error);
    if (!workspace) {
        std::cerr << "mendwright: " << error << "\n";
        return 1;
    }
    mendwright::desktop::Workspace::install(workspace.get());

    QQmlApplicationEngine engine;
    if (!mendwright::desktop::load_main_window(engine)) return 1;
    if (options.first_frame) {
        auto* window = qobject_cast<QQuickWindow*>(engine.rootObjects().constFirst());
        QObject::connect(window, &QQuickWindow::frameSwapped, &app, [] {
            std::cout << "first-frame" << std::endl;
            QCoreApplication::quit();
        }, Qt::QueuedConnection);
    }
    if (!options.grab_folder.empty()) {
        auto* window = qobject_cast<QQuickWindow*>(engine.rootObjects().constFirst());
        const QStringList written = mendwright::desktop::grab_main_views(*window, QString::fromStdString(options.grab_folder));
        for (const auto& path : written) std::cout << path.toStdString() << "\n";
        return written.isEmpty() ? 1 : 0;
    }
    return app.exec();
}
