#include "app/desktop/view_grabber.hpp"

#include <QCoreApplication>
#include <QDir>
#include <QElapsedTimer>
#include <QImage>
#include <QThread>

namespace mendwright::desktop {

namespace {

void settle(int milliseconds) {
    QElapsedTimer timer;
    timer.start();
    while (timer.elapsed() < milliseconds) {
        QCoreApplication::processEvents(QEventLoop::AllEvents, 20);
        QThread::msleep(10);
    }
}

}  // namespace

QStringList main_view_names() {
    return {QStringLiteral("jobs"),  QStringLiteral("findings"), QStringLiteral("options"),
            QStringLiteral("plans"), QStringLiteral("charts"), QStringLiteral("works"),    QStringLiteral("aftercare"),
            QStringLiteral("survey"), QStringLiteral("pricebook"), QStringLiteral("settings")};
}

QStringList grab_main_views(QQuickWindow& window, const QString& folder) {
    QStringList written;
    QDir().mkpath(folder);
    const QStringList names = main_view_names();
    for (int i = 0; i < names.size(); ++i) {
        QMetaObject::invokeMethod(&window, "showView", Q_ARG(QVariant, QVariant(names.at(i))));
        settle(400);
        const QImage image = window.grabWindow();
        const QString path = QDir(folder).filePath(QStringLiteral("%1-%2.png").arg(i + 1, 2, 10, QLatin1Char('0')).arg(names.at(i)));
        if (image.isNull() || !image.save(path)) return {};
        written << path;
    }
    return written;
}

}  // namespace mendwright::desktop
