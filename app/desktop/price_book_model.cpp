#include "app/desktop/price_book_model.hpp"

#include "app/desktop/price_book_files.hpp"

namespace mendwright::desktop {

namespace {
std::string trimmed(const QString& text) { return text.trimmed().toStdString(); }
}  // namespace

PriceBookModel::PriceBookModel(pricing::PriceBook book, std::filesystem::path folder, QObject* parent)
    : QAbstractListModel(parent), book_(std::move(book)), folder_(std::move(folder)) {}

int PriceBookModel::rowCount(const QModelIndex& parent) const { return parent.isValid() ? 0 : count(); }

QVariant PriceBookModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid)) return {};
    const pricing::PriceItem& item = book_.items.at(static_cast<std::size_t>(index.row()));
    switch (role) {
    case Qt::DisplayRole:
    case CodeRole: return QString::fromStdString(item.code);
    case DescriptionRole: return QString::fromStdString(item.description);
    case UnitRole: return QString::fromStdString(item.unit);
    case MaterialCostRole: return QString::fromStdString(pricing::pence_text(item.material_pence));
    case LabourHoursRole: return QString::fromStdString(pricing::milli_hours_text(item.labour_milli_hours));
    case CategoryRole: return QString::fromStdString(item.category);
    default: return {};
    }
}

QHash<int, QByteArray> PriceBookModel::roleNames() const {
    return {{CodeRole, "code"},           {DescriptionRole, "description"}, {UnitRole, "unit"},
            {MaterialCostRole, "materialCost"}, {LabourHoursRole, "labourHours"}, {CategoryRole, "category"}};
}

QString PriceBookModel::labourRate() const {
    return QString::fromStdString(pricing::pence_text(book_.settings.labour_rate_per_hour_pence));
}
QString PriceBookModel::markupPercent() const {
    return QString::fromStdString(pricing::basis_points_text(book_.settings.markup_on_materials_bp));
}
QString PriceBookModel::vatPercent() const { return QString::fromStdString(pricing::basis_points_text(book_.settings.vat_bp)); }
QString PriceBookModel::contingency() const {
    const auto& c = book_.settings.contingency;
    return c.is_percentage ? QString::fromStdString(pricing::basis_points_text(c.percent_bp))
                           : currencySymbol() + QString::fromStdString(pricing::pence_text(c.amount_pence));
}
QString PriceBookModel::currencySymbol() const { return QString::fromStdString(book_.settings.currency_symbol); }

void PriceBookModel::touch() {
    if (!modified_) {
        modified_ = true;
        Q_EMIT modifiedChanged();
    }
}

QString PriceBookModel::setField(int row, const QString& field, const QString& text) {
    if (row < 0 || row >= count()) return tr("no such item");
    pricing::PriceItem& item = book_.items.at(static_cast<std::size_t>(row));
    const std::string value = trimmed(text);
    int role = 0;
    if (field == QLatin1String("code")) {
        if (value.empty()) return tr("expected an item code, got an empty one");
        for (std::size_t i = 0; i < book_.items.size(); ++i)
            if (static_cast<int>(i) != row && book_.items[i].code == value) return tr("the code %1 is already in the book").arg(text.trimmed());
        item.code = value;
        role = CodeRole;
    } else if (field == QLatin1String("description")) {
        if (value.empty()) return tr("expected a description, got an empty one");
        item.description = value;
        role = DescriptionRole;
    } else if (field == QLatin1String("unit")) {
        if (value.empty()) return tr("expected a unit (each, m, hour ...), got an empty one");
        item.unit = value;
        role = UnitRole;
    } else if (field == QLatin1String("materialCost")) {
        auto pence = pricing::parse_amount_pence(value);
        if (!pence || *pence > pricing::max_item_material_pence)
            return tr("expected an amount like 12.50 (no currency sign, at most 2 decimal places), got \"%1\"").arg(text);
        item.material_pence = *pence;
        role = MaterialCostRole;
    } else if (field == QLatin1String("labourHours")) {
        auto hours = pricing::parse_milli_hours(value);
        if (!hours || *hours > pricing::max_item_labour_milli_hours)
            return tr("expected hours like 1.25 (at most 3 decimal places), got \"%1\"").arg(text);
        item.labour_milli_hours = *hours;
        role = LabourHoursRole;
    } else if (field == QLatin1String("category")) {
        item.category = value;
        role = CategoryRole;
    } else {
        return tr("no such field: %1").arg(field);
    }
    Q_EMIT dataChanged(index(row), index(row), {role});
    touch();
    return {};
}

QString PriceBookModel::setSetting(const QString& name, const QString& text) {
    const std::string value = trimmed(text);
    auto& settings = book_.settings;
    if (name == QLatin1String("labourRate")) {
        auto pence = pricing::parse_amount_pence(value);
        if (!pence) return tr("expected an hourly rate like 48.00, got \"%1\"").arg(text);
        settings.labour_rate_per_hour_pence = *pence;
    } else if (name == QLatin1String("markupPercent") || name == QLatin1String("vatPercent")) {
        auto bp = pricing::parse_basis_points(value);
        if (!bp || *bp > 100'00) return tr("expected a percentage from 0 to 100 like 17.5, got \"%1\"").arg(text);
        (name == QLatin1String("vatPercent") ? settings.vat_bp : settings.markup_on_materials_bp) = *bp;
    } else if (name == QLatin1String("contingency")) {
        const QString symbol = currencySymbol();
        if (!symbol.isEmpty() && text.trimmed().startsWith(symbol)) {
            auto pence = pricing::parse_amount_pence(trimmed(text.trimmed().mid(symbol.size())));
            if (!pence) return tr("expected a fixed amount like %1150.00, got \"%2\"").arg(symbol, text);
            settings.contingency = {false, 0, *pence};
        } else {
            auto bp = pricing::parse_basis_points(value);
            if (!bp || *bp > 100'00)
                return tr("expected a percentage like 10, or a fixed amount like %1150.00, got \"%2\"").arg(symbol, text);
            settings.contingency = {true, *bp, 0};
        }
    } else {
        return tr("no such setting: %1").arg(name);
    }
    Q_EMIT settingsChanged();
    touch();
    return {};
}

int PriceBookModel::addItem() {
    const int row = count();
    beginInsertRows({}, row, row);
    pricing::PriceItem item;
    int n = row + 1;
    auto taken = [this](const std::string& code) { return book_.find(code) != nullptr; };
    do item.code = "NEW-ITEM-" + std::to_string(n++);
    while (taken(item.code));
    item.description = tr("New item").toStdString();
    item.unit = "each";
    item.category = "other";
    item.labour_milli_hours = 250;  // the reader refuses an item priced at nothing: a quarter hour to start from
    book_.items.push_back(std::move(item));
    endInsertRows();
    Q_EMIT countChanged();
    touch();
    return row;
}

void PriceBookModel::removeItem(int row) {
    if (row < 0 || row >= count()) return;
    beginRemoveRows({}, row, row);
    book_.items.erase(book_.items.begin() + row);
    endRemoveRows();
    Q_EMIT countChanged();
    touch();
}

QString PriceBookModel::save() {
    auto written = write_price_book(book_, folder_);
    if (!written) return QString::fromStdString(written.problem().to_string());
    modified_ = false;
    Q_EMIT modifiedChanged();
    Q_EMIT saved(book_);
    return {};
}

}  // namespace mendwright::desktop
