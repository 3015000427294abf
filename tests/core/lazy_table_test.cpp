// The inverse tables of a PhaseDiagram are built on the first inverse query of a segment
// (core/boundary_segment.h): concurrent first use from several threads, copies and moves made
// before and after the first use all give the same values as a table built eagerly.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <thread>
#include <vector>

#include "core/boundary_segment.h"
#include "core/phase_diagram.h"
#include "models/reference_specs.h"

namespace pw {
namespace {

// Pressures hitting every water segment: sublimation, vaporization, the five melting curves.
const std::vector<double> kPressures{1.0,   8.94735, 611.0, 1e3, 101325.0, 1e6,      1e8,
                                     2.5e8, 3e8,     5e8,   1e9, 3e9,      6.30871e9};

// Every boundary temperature at every pressure, in order.
std::vector<double> allTemperatures(const PhaseDiagram &d) {
    std::vector<double> out;
    for (double P : kPressures)
        for (const BoundaryValue &v : d.temperaturesAt(P)) out.push_back(v.value);
    return out;
}

const Boundary &sublimationOf(const PhaseDiagram &d) {
    const Boundary *b = d.sublimation();
    EXPECT_NE(b, nullptr);
    return *b;
}

TEST(LazyCurveTable, ConcurrentFirstUseGivesTheSingleThreadedValues) {
    const PhaseDiagram reference{testdata::water()};
    const std::vector<double> expected = allTemperatures(reference);
    ASSERT_GE(expected.size(), kPressures.size());
    const PhaseDiagram shared{testdata::water()};  // no table built yet
    std::vector<std::vector<double>> results(6);
    std::vector<std::thread> threads;
    for (auto &r : results) threads.emplace_back([&shared, &r] { r = allTemperatures(shared); });
    for (auto &t : threads) t.join();
    for (const auto &r : results) EXPECT_EQ(r, expected);  // bit for bit
}

TEST(LazyCurveTable, IceSublimationTemperatureMatchesTheR14CheckValue) {
    const PhaseDiagram d{testdata::water()};
    // IAPWS R14-08(2011), check values: sublimation pressure 8.94735e-6 MPa at 230 K.
    const auto T = d.sublimationTemperature(8.94735);
    ASSERT_TRUE(T);
    EXPECT_NEAR(T->value, 230.0, 1e-4);
}

TEST(LazyCurveTable, CopiesBeforeAndAfterFirstUseAgree) {
    const PhaseDiagram reference{testdata::water()};
    const std::vector<double> expected = allTemperatures(reference);
    auto original = std::make_unique<PhaseDiagram>(testdata::water());
    const PhaseDiagram before(*original);  // copied with no table built
    EXPECT_EQ(allTemperatures(*original), expected);
    const PhaseDiagram after(*original);  // copied with every table built (shared)
    PhaseDiagram moved(std::move(*original));
    original.reset();  // the copies keep the shared tables alive
    EXPECT_EQ(allTemperatures(before), expected);
    EXPECT_EQ(allTemperatures(after), expected);
    EXPECT_EQ(allTemperatures(moved), expected);
    PhaseDiagram assigned{testdata::carbonDioxide()};
    assigned = after;
    EXPECT_EQ(allTemperatures(assigned), expected);
    // melting() points into the assigned diagram's own substance.
    const auto &own = assigned.substance().boundaries;
    for (const Boundary *m : assigned.melting()) {
        EXPECT_GE(m, &own.front());
        EXPECT_LE(m, &own.back());
    }
}

TEST(LazyCurveTable, BuildsOnFirstQueryAndSharesWithLaterCopies) {
    const PhaseDiagram d{testdata::water()};
    const Boundary &b = sublimationOf(d);
    const LazyCurveTable lazy(b.model, b.validity.min_K, b.validity.max_K);
    EXPECT_FALSE(lazy.built());
    const LazyCurveTable early(lazy);
    const double lnp = std::log(8.94735);
    const CurveTable eager(b.model, b.validity.min_K, b.validity.max_K);
    EXPECT_EQ(lazy.temperature(lnp), eager.temperature(lnp));
    EXPECT_TRUE(lazy.built());
    EXPECT_FALSE(early.built());  // builds its own on first use
    const LazyCurveTable late(lazy);
    EXPECT_TRUE(late.built());
    EXPECT_EQ(&late.get(), &lazy.get());
    EXPECT_EQ(early.temperature(lnp), eager.temperature(lnp));
    EXPECT_FALSE(LazyCurveTable().temperature(lnp));  // no model: no table
}

}  // namespace
}  // namespace pw
