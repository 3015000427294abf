// Helper program for the CTest water_vaporization_vs_iapws95: reads temperatures (K, one per
// line) on stdin and writes "T p" (K, Pa) of water's vaporization curve, IAPWS SR1-86 /
// Wagner & Pruss (1993) eq. (2.5), built with makeModel from reference_specs.h.
#include <cstdio>
#include <exception>
#include <iostream>

#include "reference_specs.h"

int main() {
    try {
        const auto model = pw::makeModel(pw::testdata::waterVaporization());
        double T = 0.0;
        while (std::cin >> T) std::printf("%.17g %.17g\n", T, model->pressure(T));
        return 0;
    } catch (const std::exception &e) {
        std::fprintf(stderr, "water_vapor_points: %s\n", e.what());
        return 1;
    }
}
