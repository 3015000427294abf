#pragma once
// The parameters each boundary model takes in a substance file (docs/substance-format.md),
// used to read `parameters` into a ModelSpec with precise messages before makeModel() runs.
#include <string>
#include <string_view>
#include <vector>

#include "core/io/reader.h"
#include "core/model_spec.h"

namespace pw::io {

enum class ParamType { Scalar, Array, String, Flag };

struct ParamSchema {
    std::string_view name;
    ParamType type = ParamType::Scalar;
    bool required = true;
    bool positive = false;  // must be > 0 (reference temperatures and pressures)
};

struct FormSchema {
    std::string_view form;
    std::vector<ParamSchema> params;
};

// Null for an unknown form.
const FormSchema *findForm(std::string_view form);
// "wagner, iapws-sublimation, ..." for messages.
std::string formList();

// Reads `parameters` (at `path`) of a model of form `schema` into `spec`; records issues.
void readParameters(const Json &parameters, const FormSchema &schema, const std::string &path,
                    Reader &reader, ModelSpec &spec);

}  // namespace pw::io
