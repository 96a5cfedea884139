#include "app/desktop/workspace.hpp"

#include <QDir>
#include <QFile>
#include <QJSEngine>
#include <QSettings>
#include <QStandardPaths>
#include <QUrl>
#include <algorithm>
#include <fstream>
#include <sstream>

#include "app/desktop/price_book_model.hpp"
#include "app/store/survey_snapshot.hpp"
#include "planner/io/survey_document.hpp"
#include "planner/pricing/quote.hpp"

namespace mendwright::desktop {

namespace {

Workspace* installed = nullptr;

const char* const store_key = "store/url";
const char* const profile_key = "rules/profile";

std::optional<std::string> read_file(const std::filesystem::path& path, std::string& error) {
    std::ifstream stream(path, std::ios::binary);
    if (!stream) {
        error = path.string() + ": cannot read the file";
        return std::nullopt;
    }
    std::ostringstream text;
    text << stream.rdbuf();
    return text.str();
}

std::string saved_setting(const char* key) {
    return QSettings().value(QString::fromLatin1(key)).toString().toStdString();
}

// The user's own price book: given, or a copy of the demo book made on first start in the
// application's data folder (so that edits never touch the shipped files).
std::filesystem::path price_book_folder(const DesktopOptions& options, std::string& error) {
    if (options.price_book_folder) return *options.price_book_folder;
    const std::filesystem::path folder =
        QStandardPaths::writableLocation(QStandardPaths::GenericDataLocation).toStdString() + "/mendwright/pricebook";
    if (std::filesystem::exists(folder / "items.csv")) return folder;
    std::error_code code;
    std::filesystem::create_directories(folder, code);
    const std::filesystem::path demo = std::filesystem::path(MENDWRIGHT_DATA_DIR) / "pricebook-demo";
    for (const char* name : {"items.csv", "settings.json"}) {
        std::filesystem::copy_file(demo / name, folder / name, std::filesystem::copy_options::skip_existing, code);
        if (code) error = (folder / name).string() + ": cannot copy the demo price book: " + code.message();
    }
    return folder;
}

}  // namespace

Workspace::~Workspace() {
    if (installed == this) installed = nullptr;
}

std::unique_ptr<Workspace> Workspace::open(const DesktopOptions& options, std::string& error) {
    std::unique_ptr<Workspace> workspace(new Workspace());
    workspace->preset_quote_path_ = QString::fromStdString(options.quote_path);

    std::optional<std::string> url_text = options.database_url;
    if (!url_text && qEnvironmentVariableIsEmpty("MENDWRIGHT_DB")) {
        const std::string saved = saved_setting(store_key);
        if (!saved.empty()) url_text = saved;
    }
    auto url = store::resolve_database_url(url_text);
    if (!url) {
        error = url.error().to_string();
        return nullptr;
    }
    auto store = store::JobStore::open(*url, store::OpenOptions{options.clock ? options.clock : store::system_today, {}});
    if (!store) {
        error = store.error().to_string();
        return nullptr;
    }
    workspace->store_ = std::move(*store);

    std::string profile_file = options.profile_file.value_or(saved_setting(profile_key));
    if (profile_file.empty()) {
        workspace->profile_ = rules::default_rules_profile();
        workspace->profile_source_ = "shipped";
    } else {
        auto text = read_file(profile_file, error);
        if (!text) return nullptr;
        auto profile = rules::parse_rules_profile(*text);
        if (!profile) {
            error = profile_file + ": " + profile.problem().to_string();
            return nullptr;
        }
        workspace->profile_ = std::move(profile).value();
        workspace->profile_source_ = profile_file;
    }

    workspace->book_folder_ = price_book_folder(options, error);
    if (!error.empty()) return nullptr;
    auto book = pricing::read_price_book(workspace->book_folder_);
    if (!book) {
        error = "price book " + workspace->book_folder_.string() + ": " + book.problem().to_string();
        return nullptr;
    }
    workspace->book_ = std::move(book).value();
    workspace->price_book_model_ = new PriceBookModel(workspace->book_, workspace->book_folder_, workspace.get());
    QObject::connect(workspace->price_book_model_, &PriceBookModel::saved, workspace.get(),
                     [w = workspace.get()](const pricing::PriceBook& saved) { w->setBook(saved); });

    // First start: an empty store gets the invented demo jobs.
    if (options.seed_demo && !options.demo_folder.empty()) {
        auto existing = workspace->store_->list_jobs(store::JobFilter{false, false, 1});
        if (!existing) {
            error = existing.error().to_string();
            return nullptr;
        }
        if (existing->empty()) {
            std::vector<std::filesystem::path> files;
            std::error_code code;
            for (const auto& entry : std::filesystem::directory_iterator(options.demo_folder, code))
                if (entry.path().extension() == ".json") files.push_back(entry.path());
            std::sort(files.begin(), files.end());
            for (const auto& file : files) {
                std::string problem;
                auto text = read_file(file, problem);
                if (text && workspace->addSurvey(*text, problem)) ++workspace->seeded_jobs_;
                if (!problem.empty()) {
                    error = file.string() + ": " + problem;
                    return nullptr;
                }
            }
        }
    }
    return workspace;
}

void Workspace::install(Workspace* workspace) { installed = workspace; }

Workspace* Workspace::instance() { return installed; }

Workspace* Workspace::create(QQmlEngine*, QJSEngine*) {
    Q_ASSERT(installed);
    QJSEngine::setObjectOwnership(installed, QJSEngine::CppOwnership);
    return installed;
}

QString Workspace::storeText() const { return QString::fromStdString(store_->url().display()); }
QString Workspace::profileName() const { return QString::fromStdString(profile_.name); }
QString Workspace::priceBookFolder() const { return QString::fromStdString(book_folder_.string()); }

QString Workspace::caution() {
    QStringList lines;
    for (const auto& line : pricing::quote_cautions()) lines << QString::fromStdString(line);
    return lines.mid(0, 2).join(QLatin1Char(' '));
}

QString Workspace::today() const { return QString::fromStdString(store_->today().to_iso()); }
QString Workspace::savedStoreUrl() const { return QString::fromStdString(saved_setting(store_key)); }
QString Workspace::savedProfileFile() const { return QString::fromStdString(saved_setting(profile_key)); }

void Workspace::setBook(pricing::PriceBook book) {
    book_ = std::move(book);
    Q_EMIT priceBookChanged();
}

void Workspace::setErrorText(const QString& text) {
    if (text == error_text_) return;
    error_text_ = text;
    Q_EMIT errorTextChanged();
}

std::optional<store::JobId> Workspace::addSurvey(const std::string& text, std::string& error) {
    const io::SurveyLoad load = io::read_survey(text);
    if (!load.ok()) {
        const auto errors = load.errors();
        error = "invalid survey document: " + errors.front().to_string();
        if (errors.size() > 1) error += " (and " + std::to_string(errors.size() - 1) + " more)";
        return std::nullopt;
    }
    auto id = store_->add_job(store::survey_snapshot(*load.installation, text, profile_));
    if (!id) {
        error = id.error().to_string();
        return std::nullopt;
    }
    return *id;
}

qint64 Workspace::importSurvey(const QString& file) {
    std::string error;
    auto text = read_file(localPath(file).toStdString(), error);
    std::optional<store::JobId> id;
    if (text) id = addSurvey(*text, error);
    if (!id) {
        setErrorText(QString::fromStdString(error));
        return -1;
    }
    setErrorText({});
    Q_EMIT jobsChanged();
    return *id;
}

qint64 Workspace::createJob(const QString& reference, const QString& client, const QString& site) {
    model::Installation installation;
    installation.job.reference = reference.trimmed().toStdString();
    installation.job.client = client.trimmed().toStdString();
    installation.job.site = site.trimmed().toStdString();
    installation.job.inspection_date = store_->today();
    installation.job.country = "england";
    model::Board board;
    board.id = "cu";
    board.name = "Consumer unit";
    model::Device main_switch;
    main_switch.id = "ms";
    main_switch.kind = model::DeviceKind::main_switch;
    main_switch.rating_amps = 100.0;
    board.devices.push_back(main_switch);
    installation.boards.push_back(board);
    std::string error;
    if (installation.job.client.empty()) error = "client: expected the client's name, got an empty one";
    else if (installation.job.site.empty()) error = "site: expected the site, got an empty one";
    std::optional<store::JobId> id;
    if (error.empty()) id = addSurvey(io::write_survey(installation), error);
    if (!id) {
        setErrorText(QString::fromStdString(error));
        return -1;
    }
    setErrorText({});
    Q_EMIT jobsChanged();
    return *id;
}

bool Workspace::saveSettings(const QString& store_url, const QString& profile_file) {
    const std::string url = store_url.trimmed().toStdString();
    if (!url.empty()) {
        auto parsed = store::parse_database_url(url, "store");
        if (!parsed) {
            setErrorText(QString::fromStdString(parsed.error().to_string()));
            return false;
        }
    }
    const std::string profile = localPath(profile_file.trimmed()).toStdString();
    if (!profile.empty()) {
        std::string error;
        auto text = read_file(profile, error);
        if (!text) {
            setErrorText(QString::fromStdString(error));
            return false;
        }
        if (auto parsed = rules::parse_rules_profile(*text); !parsed) {
            setErrorText(QString::fromStdString(profile + ": " + parsed.problem().to_string()));
            return false;
        }
    }
    QSettings settings;
    settings.setValue(QString::fromLatin1(store_key), QString::fromStdString(url));
    settings.setValue(QString::fromLatin1(profile_key), QString::fromStdString(profile));
    settings.sync();
    setErrorText({});
    Q_EMIT settingsChanged();
    return true;
}

QString Workspace::defaultQuotePath(const QString& reference) const {
    QString folder = QStandardPaths::writableLocation(QStandardPaths::DocumentsLocation);
    if (folder.isEmpty()) folder = QDir::homePath();
    QString name = reference.isEmpty() ? QStringLiteral("quote") : reference;
    name.replace(QLatin1Char('/'), QLatin1Char('-'));
    return QDir(folder).filePath(name + QStringLiteral("-quote.xlsx"));
}

QString Workspace::localPath(const QString& file_or_url) {
    if (file_or_url.startsWith(QLatin1String("file:"))) return QUrl(file_or_url).toLocalFile();
    return file_or_url;
}

}  // namespace mendwright::desktop
