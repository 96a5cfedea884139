#pragma once
// The application's services for QML (a singleton): the job store, the rules profile and the
// price book, opened once at start. Opening seeds the invented demo jobs into an empty store
// (first run), so that the program starts with something to work on.
//
//   auto opened = Workspace::open(options);            // main.cpp, before the QML engine loads
//   if (!opened) { show(opened.error()); return 1; }
//   Workspace::install(opened->get());                  // QML's `Workspace` is this object

#include <QObject>
#include <QString>
#include <QtQml/qqmlregistration.h>
#include <filesystem>
#include <memory>
#include <optional>
#include <string>

#include "app/store/job_store.hpp"
#include "planner/pricing/price_book.hpp"
#include "planner/rules/profile.hpp"

class QQmlEngine;
class QJSEngine;

namespace mendwright::desktop {

class PriceBookModel;

struct DesktopOptions {
    std::optional<std::string> database_url;       // --db; else $MENDWRIGHT_DB, the saved setting, the embedded file
    std::optional<std::string> price_book_folder;  // --pricebook; else the user's copy (made from the demo book)
    std::optional<std::string> profile_file;       // --profile; else the saved setting, else the shipped profile
    std::string demo_folder;                       // survey documents seeded into an empty store
    bool seed_demo = true;                         // --no-demo turns the seeding off
    store::Clock clock;                            // "today"; the system date when empty
    std::string quote_path;                        // --quote-path: export there without asking (tests, scripts)
};

class Workspace : public QObject {
    Q_OBJECT
    QML_ELEMENT
    QML_SINGLETON
    Q_PROPERTY(QString storeText READ storeText CONSTANT)
    Q_PROPERTY(QString profileName READ profileName CONSTANT)
    Q_PROPERTY(QString priceBookFolder READ priceBookFolder CONSTANT)
    Q_PROPERTY(QString caution READ caution CONSTANT)
    Q_PROPERTY(QString today READ today CONSTANT)
    Q_PROPERTY(QString errorText READ errorText NOTIFY errorTextChanged)
    Q_PROPERTY(QString savedStoreUrl READ savedStoreUrl NOTIFY settingsChanged)
    Q_PROPERTY(QString savedProfileFile READ savedProfileFile NOTIFY settingsChanged)
    Q_PROPERTY(int seededJobs READ seededJobs CONSTANT)
    Q_PROPERTY(QString presetQuotePath READ presetQuotePath CONSTANT)
    Q_PROPERTY(mendwright::desktop::PriceBookModel* priceBook READ priceBook CONSTANT)

public:
    ~Workspace() override;

    // Opens the store (creating or upgrading it), the profile and the price book; seeds demo jobs.
    static std::unique_ptr<Workspace> open(const DesktopOptions& options, std::string& error);
    // Makes `workspace` the object QML's singleton returns (main and tests call it once).
    static void install(Workspace* workspace);
    static Workspace* instance();
    static Workspace* create(QQmlEngine* engine, QJSEngine* script_engine);

    [[nodiscard]] QString storeText() const;
    [[nodiscard]] QString profileName() const;
    [[nodiscard]] QString priceBookFolder() const;
    [[nodiscard]] static QString caution();
    [[nodiscard]] QString today() const;
    [[nodiscard]] QString errorText() const { return error_text_; }
    [[nodiscard]] QString savedStoreUrl() const;
    [[nodiscard]] QString savedProfileFile() const;
    [[nodiscard]] int seededJobs() const { return seeded_jobs_; }
    [[nodiscard]] QString presetQuotePath() const { return preset_quote_path_; }
    [[nodiscard]] PriceBookModel* priceBook() const { return price_book_model_; }

    // A survey document from a file (path or file: URL) as a new job; its id, or -1 (errorText says why).
    Q_INVOKABLE qint64 importSurvey(const QString& file);
    // A new job with an empty survey (one consumer unit, TT supply) to be filled in; id or -1.
    Q_INVOKABLE qint64 createJob(const QString& reference, const QString& client, const QString& site);
    // Settings used from the next start: the store URL (empty: the embedded file) and the rules
    // profile file (empty: the shipped profile). Both are checked first; false and errorText if wrong.
    Q_INVOKABLE bool saveSettings(const QString& store_url, const QString& profile_file);
    // Where a quote of the job goes by default: the user's documents folder.
    Q_INVOKABLE QString defaultQuotePath(const QString& reference) const;
    // A local path from a path or a file: URL.
    Q_INVOKABLE static QString localPath(const QString& file_or_url);

    store::JobStore& store() { return *store_; }
    [[nodiscard]] const rules::RulesProfile& profile() const { return profile_; }
    [[nodiscard]] const pricing::PriceBook& book() const { return book_; }
    void setBook(pricing::PriceBook book);
    [[nodiscard]] Date todayDate() const { return store_->today(); }
    void setErrorText(const QString& text);
    // Adds a job from survey text; the problem text on failure.
    std::optional<store::JobId> addSurvey(const std::string& text, std::string& error);
    // Tell every job list that jobs changed (added, status, urgent items).
    void notifyJobsChanged() { Q_EMIT jobsChanged(); }

Q_SIGNALS:
    void errorTextChanged();
    void settingsChanged();
    void jobsChanged();
    void priceBookChanged();

private:
    Workspace() = default;

    std::unique_ptr<store::JobStore> store_;
    rules::RulesProfile profile_;
    std::string profile_source_;
    pricing::PriceBook book_;
    std::filesystem::path book_folder_;
    PriceBookModel* price_book_model_ = nullptr;
    QString error_text_;
    int seeded_jobs_ = 0;
    QString preset_quote_path_;
};

}  // namespace mendwright::desktop
