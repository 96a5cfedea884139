#include "app/desktop/price_book_files.hpp"

#include <QFile>
#include <QSaveFile>
#include <nlohmann/json.hpp>

namespace mendwright::desktop {

namespace {

// RFC 4180: a field holding a comma, quote or line break goes in quotes, quotes doubled.
std::string csv_field(const std::string& text) {
    if (text.find_first_of(",\"\r\n") == std::string::npos) return text;
    std::string quoted = "\"";
    for (char c : text) {
        if (c == '"') quoted += '"';
        quoted += c;
    }
    return quoted + "\"";
}

Result<bool> save_text(const std::filesystem::path& path, const std::string& text) {
    QSaveFile file(QString::fromStdString(path.string()));
    if (!file.open(QIODevice::WriteOnly)) return problem(path.string(), "cannot write: " + file.errorString().toStdString());
    file.write(text.data(), static_cast<qint64>(text.size()));
    if (!file.commit()) return problem(path.string(), "cannot write: " + file.errorString().toStdString());
    return true;
}

}  // namespace

std::string price_items_csv(const std::vector<pricing::PriceItem>& items) {
    std::string text = "code,description,unit,material_cost,labour_hours,category\n";
    for (const auto& item : items) {
        text += csv_field(item.code) + "," + csv_field(item.description) + "," + csv_field(item.unit) + "," +
                pricing::pence_text(item.material_pence) + "," + pricing::milli_hours_text(item.labour_milli_hours) + "," +
                csv_field(item.category) + "\n";
    }
    return text;
}

std::string pricing_settings_json(const pricing::PricingSettings& settings) {
    nlohmann::ordered_json json;
    json["format"] = "mendwright-price-settings";
    json["version"] = 1;
    json["currency"] = settings.currency_code;
    json["currency_symbol"] = settings.currency_symbol;
    json["labour_rate_per_hour"] = pricing::pence_text(settings.labour_rate_per_hour_pence);
    json["markup_on_materials_percent"] = pricing::basis_points_text(settings.markup_on_materials_bp);
    json["vat_percent"] = pricing::basis_points_text(settings.vat_bp);
    if (settings.contingency.is_percentage)
        json["contingency"] = {{"percent", pricing::basis_points_text(settings.contingency.percent_bp)}};
    else
        json["contingency"] = {{"amount", pricing::pence_text(settings.contingency.amount_pence)}};
    json["quote_validity_days"] = settings.quote_validity_days;
    return json.dump(2) + "\n";
}

Result<bool> write_price_book(const pricing::PriceBook& book, const std::filesystem::path& folder) {
    const std::string items = price_items_csv(book.items);
    const std::string settings = pricing_settings_json(book.settings);
    if (auto check = pricing::parse_price_items(items); !check) return check.problem();
    if (auto check = pricing::parse_pricing_settings(settings); !check) return check.problem();
    std::error_code code;
    std::filesystem::create_directories(folder, code);
    if (code) return problem(folder.string(), "cannot create the folder: " + code.message());
    if (auto saved = save_text(folder / "items.csv", items); !saved) return saved.problem();
    if (auto saved = save_text(folder / "settings.json", settings); !saved) return saved.problem();
    return true;
}

}  // namespace mendwright::desktop
