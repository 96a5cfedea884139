#pragma once
// The price book as the editor shows it: its items (a list) and its settings (labour rate,
// markup, VAT, contingency). Every value is typed as text and checked by the pricing module's
// own readers (money.hpp: R2, R3, R4) before it is taken; save() writes both files.

#include <QAbstractListModel>
#include <QtQml/qqmlregistration.h>
#include <filesystem>

#include "planner/pricing/price_book.hpp"

namespace mendwright::desktop {

class PriceBookModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("The price book belongs to the Workspace")
    Q_PROPERTY(int count READ count NOTIFY countChanged)
    Q_PROPERTY(QString labourRate READ labourRate NOTIFY settingsChanged)
    Q_PROPERTY(QString markupPercent READ markupPercent NOTIFY settingsChanged)
    Q_PROPERTY(QString vatPercent READ vatPercent NOTIFY settingsChanged)
    Q_PROPERTY(QString contingency READ contingency NOTIFY settingsChanged)
    Q_PROPERTY(QString currencySymbol READ currencySymbol NOTIFY settingsChanged)
    Q_PROPERTY(bool modified READ modified NOTIFY modifiedChanged)

public:
    enum Role { CodeRole = Qt::UserRole + 1, DescriptionRole, UnitRole, MaterialCostRole, LabourHoursRole, CategoryRole };

    PriceBookModel(pricing::PriceBook book, std::filesystem::path folder, QObject* parent = nullptr);

    [[nodiscard]] int rowCount(const QModelIndex& parent = {}) const override;
    [[nodiscard]] QVariant data(const QModelIndex& index, int role) const override;
    [[nodiscard]] QHash<int, QByteArray> roleNames() const override;

    [[nodiscard]] int count() const { return static_cast<int>(book_.items.size()); }
    [[nodiscard]] QString labourRate() const;
    [[nodiscard]] QString markupPercent() const;
    [[nodiscard]] QString vatPercent() const;
    [[nodiscard]] QString contingency() const;
    [[nodiscard]] QString currencySymbol() const;
    [[nodiscard]] bool modified() const { return modified_; }
    [[nodiscard]] const pricing::PriceBook& book() const { return book_; }

    // field: "code", "description", "unit", "materialCost", "labourHours", "category".
    // Returns "" when taken, else what was expected.
    Q_INVOKABLE QString setField(int row, const QString& field, const QString& text);
    // name: "labourRate", "markupPercent", "vatPercent", "contingency" (a percent like "10", or "£150.00" fixed).
    Q_INVOKABLE QString setSetting(const QString& name, const QString& text);
    Q_INVOKABLE int addItem();
    Q_INVOKABLE void removeItem(int row);
    // Writes items.csv and settings.json; "" when saved, else the problem.
    Q_INVOKABLE QString save();

Q_SIGNALS:
    void countChanged();
    void settingsChanged();
    void modifiedChanged();
    void saved(const mendwright::pricing::PriceBook& book);

private:
    void touch();
    pricing::PriceBook book_;
    std::filesystem::path folder_;
    bool modified_ = false;
};

}  // namespace mendwright::desktop
