// Qt Quick tests of the QML module Mendwright: the tst_*.qml files beside this one.
#include <QQmlEngine>
#include <QtQml/qqmlextensionplugin.h>
#include <QtQuickTest>
#include <memory>

#include "app/desktop/application.hpp"
#include "test_workspace.hpp"

Q_IMPORT_QML_PLUGIN(Mendwright_ModelsPlugin)
Q_IMPORT_QML_PLUGIN(MendwrightPlugin)

class Setup : public QObject {
    Q_OBJECT

public Q_SLOTS:
    void applicationAvailable() {
        mendwright::desktop::set_application_identity();
        fixture_ = std::make_unique<mendwright::desktop::test::TestWorkspace>();
        if (!fixture_->workspace) qFatal("test workspace: %s", fixture_->error.c_str());
    }
    void qmlEngineAvailable(QQmlEngine* engine) { engine->addImportPath(QStringLiteral("qrc:/")); }
    void cleanupTestCase() { fixture_.reset(); }

private:
    std::unique_ptr<mendwright::desktop::test::TestWorkspace> fixture_;
};

QUICK_TEST_MAIN_WITH_SETUP(mendwright_components, Setup)
#include "main.moc"
