#pragma once
// The totals of a works list as QML shows them: a value type of ready-made texts.

#include <QObject>
#include <QString>
#include <QtQml/qqmlregistration.h>

#include "planner/pricing/works.hpp"

namespace mendwright::desktop {

class MoneyFigures {
    Q_GADGET
    QML_VALUE_TYPE(moneyFigures)
    Q_PROPERTY(QString materials MEMBER materials)
    Q_PROPERTY(QString labour MEMBER labour)
    Q_PROPERTY(QString subtotal MEMBER subtotal)
    Q_PROPERTY(QString contingency MEMBER contingency)
    Q_PROPERTY(QString markup MEMBER markup)
    Q_PROPERTY(QString net MEMBER net)
    Q_PROPERTY(QString vat MEMBER vat)
    Q_PROPERTY(QString total MEMBER total)
    Q_PROPERTY(QString hoursOnSite MEMBER hoursOnSite)
    Q_PROPERTY(qint64 totalPence MEMBER totalPence)

public:
    QString materials, labour, subtotal, contingency, markup, net, vat, total, hoursOnSite;
    qint64 totalPence = 0;

    bool operator==(const MoneyFigures&) const = default;

    static MoneyFigures of(const pricing::WorksTotals& totals);
};

}  // namespace mendwright::desktop
