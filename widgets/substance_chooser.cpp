#include "widgets/substance_chooser.h"

#include <QLineEdit>
#include <QListWidget>
#include <QPushButton>
#include <QVBoxLayout>

namespace pw::ui {
namespace {

constexpr int kIndexRole = Qt::UserRole + 1;

bool matchesFilter(const Substance &s, const QString &filter) {
    if (filter.isEmpty()) return true;
    auto has = [&](const std::string &text) {
        return QString::fromStdString(text).contains(filter, Qt::CaseInsensitive);
    };
    if (has(s.name) || has(s.formula) || has(s.id) || has(s.cas)) return true;
    for (const auto &alias : s.aliases)
        if (has(alias)) return true;
    return false;
}

QString tooltipFor(const Substance &s) {
    QStringList aliases;
    for (const auto &a : s.aliases) aliases << QString::fromStdString(a);
    QString tip = QString::fromStdString(s.name);
    if (!s.formula.empty()) tip += QStringLiteral(" (%1)").arg(QString::fromStdString(s.formula));
    if (!aliases.isEmpty())
        tip += QObject::tr("\nAlso: %1").arg(aliases.join(QStringLiteral(", ")));
    tip += QObject::tr("\nFrom: %1").arg(QString::fromStdString(s.origin));
    return tip;
}

}  // namespace

SubstanceChooser::SubstanceChooser(SubstanceLibrary &library, QWidget *parent)
    : QWidget(parent), library_(library), search_(new QLineEdit), list_(new QListWidget) {
    auto *layout = new QVBoxLayout(this);
    search_->setPlaceholderText(tr("Search name, formula or alias"));
    search_->setClearButtonEnabled(true);
    search_->setToolTip(
        tr("Type part of a name, formula, CAS number or alias; Enter chooses "
           "the first match"));
    list_->setToolTip(tr("Click a substance to show its diagram"));
    list_->setUniformItemSizes(true);
    auto *open = new QPushButton(tr("Open substance file…"));
    open->setToolTip(tr("Load a Phasewright substance file (.json) from disk"));
    layout->addWidget(search_);
    layout->addWidget(list_, 1);
    layout->addWidget(open);
    connect(search_, &QLineEdit::textChanged, this, [this] { applyFilter(); });
    connect(search_, &QLineEdit::returnPressed, this, [this] { chooseFirstVisible(); });
    connect(list_, &QListWidget::itemClicked, this, &SubstanceChooser::choose);
    connect(list_, &QListWidget::itemActivated, this, &SubstanceChooser::choose);
    connect(open, &QPushButton::clicked, this, &SubstanceChooser::openFileRequested);
    refresh();
}

void SubstanceChooser::refresh() {
    list_->clear();
    const auto &all = library_.all();
    for (std::size_t i = 0; i < all.size(); ++i) {
        const Substance &s = all[i]->substance();
        QString text = QString::fromStdString(s.name);
        if (!s.formula.empty())
            text += QStringLiteral("  ·  %1").arg(QString::fromStdString(s.formula));
        auto *item = new QListWidgetItem(text, list_);
        item->setData(kIndexRole, static_cast<int>(i));
        item->setToolTip(tooltipFor(s));
    }
    applyFilter();
}

void SubstanceChooser::applyFilter() {
    const QString filter = search_->text().trimmed();
    const auto &all = library_.all();
    for (int r = 0; r < list_->count(); ++r) {
        QListWidgetItem *item = list_->item(r);
        const auto i = static_cast<std::size_t>(item->data(kIndexRole).toInt());
        item->setHidden(i >= all.size() || !matchesFilter(all[i]->substance(), filter));
    }
}

void SubstanceChooser::setFilter(const QString &text) { search_->setText(text); }

int SubstanceChooser::visibleCount() const {
    int n = 0;
    for (int r = 0; r < list_->count(); ++r) n += list_->item(r)->isHidden() ? 0 : 1;
    return n;
}

bool SubstanceChooser::chooseFirstVisible() {
    for (int r = 0; r < list_->count(); ++r)
        if (!list_->item(r)->isHidden()) {
            choose(list_->item(r));
            return true;
        }
    return false;
}

void SubstanceChooser::choose(QListWidgetItem *item) {
    if (!item) return;
    const auto i = static_cast<std::size_t>(item->data(kIndexRole).toInt());
    if (i < library_.all().size()) emit substanceChosen(library_.all()[i]);
}

void SubstanceChooser::setCurrent(const DiagramPtr &diagram) {
    const auto &all = library_.all();
    for (int r = 0; r < list_->count(); ++r) {
        const auto i = static_cast<std::size_t>(list_->item(r)->data(kIndexRole).toInt());
        if (i < all.size() && all[i] == diagram) {
            const QSignalBlocker block(list_);
            list_->setCurrentRow(r);
            return;
        }
    }
    list_->clearSelection();
}

}  // namespace pw::ui
