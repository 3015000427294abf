#pragma once
// The comparison table of two substances (core/compare.h) in the user's units: one row per
// quantity, a column per substance and the difference B − A, with the chosen temperature and
// pressure typed above it and the volatility verdict below.
#include <QWidget>
#include <optional>

#include "core/compare.h"
#include "widgets/document.h"
#include "widgets/settings.h"

class QLabel;
class QLineEdit;
class QTableWidget;

namespace pw::ui {

class CompareTable : public QWidget {
    Q_OBJECT
public:
    explicit CompareTable(QWidget *parent = nullptr);

    void setSubstances(DiagramPtr a, DiagramPtr b);
    void setUnits(DisplayUnits units);
    // Conditions in kelvin and pascal (nullopt: leave the row out). Updates the entry fields.
    void setConditions(std::optional<double> T_K, std::optional<double> P_Pa);

    QTableWidget *table() const { return table_; }
    const std::optional<Comparison> &comparison() const { return comparison_; }
    QString verdictText() const;

signals:
    void message(const QString &text);

private:
    void readFields();
    void rebuild();
    void fillRow(int row, const CompareRow &r);

    DiagramPtr a_, b_;
    DisplayUnits units_;
    CompareConditions conditions_;
    std::optional<Comparison> comparison_;
    QLineEdit *temperature_;
    QLineEdit *pressure_;
    QTableWidget *table_;
    QLabel *verdict_;
};

// Cell texts of one row in `units`: {A, B, B − A}.
struct CompareCells {
    QString a, b, difference;
};
CompareCells compareCells(const CompareRow &row, const DisplayUnits &units);

}  // namespace pw::ui
