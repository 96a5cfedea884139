#include "app/desktop/application.hpp"

#include <QCoreApplication>
#include <QQuickStyle>
#include <QUrl>

namespace mendwright::desktop {

std::string launch_usage() {
    return "usage: mendwright [--db URL] [--pricebook DIR] [--profile FILE] [--no-demo] [--demo-dir DIR]\n"
           "                  [--quote-path FILE] [--grab DIR]\n"
           "  --db URL          job store: sqlite:PATH or postgresql://USER@HOST[:PORT]/NAME\n"
           "                    (default: $MENDWRIGHT_DB, the saved setting, or the embedded SQLite file)\n"
           "  --pricebook DIR   price book folder (items.csv, settings.json); default: your own copy\n"
           "  --profile FILE    rules profile JSON; default: the saved setting or the shipped profile\n"
           "  --no-demo         do not seed the invented demo jobs into an empty store\n"
           "  --demo-dir DIR    survey documents to seed an empty store with (default: the demo jobs)\n"
           "  --quote-path FILE export quotes to FILE without asking\n"
           "  --grab DIR        render every main view of the first job to DIR/*.png and quit\n"
           "  --first-frame     print \"first-frame\" when the first frame is on screen, and quit\n";
}

std::optional<std::string> parse_launch_options(const QStringList& arguments, LaunchOptions& options) {
    options.desktop.demo_folder = std::string(MENDWRIGHT_DATA_DIR) + "/pricebook-demo/jobs";
    for (int i = 0; i < arguments.size(); ++i) {
        const QString& flag = arguments.at(i);
        auto value = [&](std::string& out) -> std::optional<std::string> {
            if (i + 1 >= arguments.size()) return flag.toStdString() + ": expected a value after it";
            out = arguments.at(++i).toStdString();
            return std::nullopt;
        };
        std::string text;
        std::optional<std::string> missing;
        if (flag == QLatin1String("--db")) {
            if ((missing = value(text))) return missing;
            options.desktop.database_url = text;
        } else if (flag == QLatin1String("--pricebook")) {
            if ((missing = value(text))) return missing;
            options.desktop.price_book_folder = text;
        } else if (flag == QLatin1String("--profile")) {
            if ((missing = value(text))) return missing;
            options.desktop.profile_file = text;
        } else if (flag == QLatin1String("--demo-dir")) {
            if ((missing = value(options.desktop.demo_folder))) return missing;
        } else if (flag == QLatin1String("--quote-path")) {
            if ((missing = value(options.desktop.quote_path))) return missing;
        } else if (flag == QLatin1String("--grab")) {
            if ((missing = value(options.grab_folder))) return missing;
        } else if (flag == QLatin1String("--first-frame")) {
            options.first_frame = true;
        } else if (flag == QLatin1String("--no-demo")) {
            options.desktop.seed_demo = false;
        } else if (flag == QLatin1String("--help") || flag == QLatin1String("-h")) {
            options.help = true;
        } else {
            return flag.toStdString() + ": unknown option (see --help)";
        }
    }
    return std::nullopt;
}

void set_application_identity() {
    QCoreApplication::setOrganizationName(QStringLiteral("mendwright"));
    QCoreApplication::setApplicationName(QStringLiteral("mendwright"));
    QCoreApplication::setApplicationVersion(QStringLiteral(MENDWRIGHT_VERSION));
}

bool load_main_window(QQmlApplicationEngine& engine) {
    // Qt 6.4: a static QML module's files live under qrc:/<URI path>/ (TOOLCHAIN.md, pitfall 1).
    // The Basic style: the one Mendwright's own dress (qml/Theme.qml) is drawn over.
    QQuickStyle::setStyle(QStringLiteral("Basic"));
    engine.addImportPath(QStringLiteral("qrc:/"));
    engine.load(QUrl(QStringLiteral("qrc:/Mendwright/Main.qml")));
    return !engine.rootObjects().isEmpty();
}

}  // namespace mendwright::desktop
