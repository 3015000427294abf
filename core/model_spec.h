#pragma once
// The description of a boundary model as written in a substance file: the form's name, its
// named parameters in the units they were published in, and those units. makeModel() turns
// it into a BoundaryModel working in K and Pa. Keeping the spec beside the model lets a
// substance be written back exactly as it was read (and lets fits write their results).
#include <map>
#include <string>
#include <vector>

#include "core/boundary_model.h"
#include "core/units.h"

namespace pw {

struct ModelSpec {
    std::string form;                       // "wagner", "antoine", ... (docs/substance-format.md)
    std::map<std::string, double> scalars;  // "T_ref", "P_ref", "A", "dH_J_mol"...
    std::map<std::string, std::vector<double>> arrays;  // "a", "exponents", "b"
    std::map<std::string, std::string> strings;         // "base", "exponent_set"
    std::map<std::string, bool> flags;                  // "log"
    TemperatureUnit tUnit = TemperatureUnit::Kelvin;    // units the parameters are in
    PressureUnit pUnit = PressureUnit::Pa;
};

// Error in a model spec; `parameter()` names the offending parameter ("a", "T_ref", "base").
class ModelSpecError : public std::runtime_error {
public:
    ModelSpecError(std::string parameter, const std::string &what)
        : std::runtime_error(what), parameter_(std::move(parameter)) {}
    const std::string &parameter() const { return parameter_; }

private:
    std::string parameter_;
};

// Builds the model; throws ModelSpecError for an unknown form, a missing parameter, arrays
// of unequal or zero length, non-finite values, or an unknown base/exponent set.
BoundaryModelPtr makeModel(const ModelSpec &spec);

// Names of all supported forms, for messages and the docs.
const std::vector<std::string> &modelForms();

}  // namespace pw
