#include <fmt/format.h>
#include <cmath>

#include "core/phase_diagram.h"

namespace pw {

std::vector<Finding> PhaseDiagram::consistency() const { return {}; }

}  // namespace pw
