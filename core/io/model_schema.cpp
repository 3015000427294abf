#include "core/io/model_schema.h"

#include <fmt/format.h>
#include <algorithm>
#include <cmath>

namespace pw::io {
namespace {

using P = ParamType;

const std::vector<FormSchema> &schemas() {
    static const std::vector<FormSchema> all{
        {"wagner",
         {{"T_ref", P::Scalar, true, true},
          {"P_ref", P::Scalar, true, true},
          {"a", P::Array},
          {"exponents", P::Array, false},
          {"exponent_set", P::String, false}}},
        {"iapws-sublimation",
         {{"T_ref", P::Scalar, true, true},
          {"P_ref", P::Scalar, true, true},
          {"a", P::Array},
          {"b", P::Array}}},
        {"antoine", {{"base", P::String}, {"A", P::Scalar}, {"B", P::Scalar}, {"C", P::Scalar}}},
        {"antoine-extended",
         {{"base", P::String},
          {"A", P::Scalar},
          {"B", P::Scalar},
          {"C", P::Scalar, false},
          {"D", P::Scalar, false},
          {"E", P::Scalar, false},
          {"F", P::Scalar, false}}},
        {"clausius-clapeyron",
         {{"T_ref", P::Scalar, true, true},
          {"P_ref", P::Scalar, true, true},
          {"dH_J_mol", P::Scalar, true, true}}},
        {"lee-kesler",
         {{"T_c", P::Scalar, true, true}, {"P_c", P::Scalar, true, true}, {"omega", P::Scalar}}},
        {"ambrose-walton",
         {{"T_c", P::Scalar, true, true}, {"P_c", P::Scalar, true, true}, {"omega", P::Scalar}}},
        {"clapeyron-linear",
         {{"T_ref", P::Scalar, true, true},
          {"P_ref", P::Scalar, true, true},
          {"dH_J_mol", P::Scalar},
          {"dV_m3_mol", P::Scalar}}},
        {"clapeyron-integrated",
         {{"T_ref", P::Scalar, true, true},
          {"P_ref", P::Scalar, true, true},
          {"dH_J_mol", P::Scalar},
          {"dV_m3_mol", P::Scalar}}},
        {"simon-glatzel",
         {{"T_ref", P::Scalar, true, true},
          {"P_ref", P::Scalar, true, true},
          {"a", P::Scalar},
          {"c", P::Scalar}}},
        {"melting-polynomial",
         {{"T_ref", P::Scalar, true, true},
          {"P_ref", P::Scalar, true, true},
          {"a", P::Array},
          {"exponents", P::Array}}},
        {"iapws-melting",
         {{"T_ref", P::Scalar, true, true},
          {"P_ref", P::Scalar, true, true},
          {"a", P::Array},
          {"b", P::Array},
          {"log", P::Flag, false}}},
    };
    return all;
}

std::string paramList(const FormSchema &schema) {
    std::string s;
    for (const auto &p : schema.params) s += (s.empty() ? "" : ", ") + std::string(p.name);
    return s;
}

const char *typeWord(ParamType type) {
    switch (type) {
        case P::Scalar:
            return "a number";
        case P::Array:
            return "a non-empty array of numbers";
        case P::String:
            return "a string";
        case P::Flag:
            return "true or false";
    }
    return "";
}

void readArray(const Json &v, const ParamSchema &p, const std::string &here, Reader &reader,
               ModelSpec &spec) {
    if (!v.is_array() || v.empty()) {
        reader.error(here, fmt::format("expected {}, found {}", typeWord(p.type),
                                       v.is_array() ? "an empty array" : describeType(v)));
        return;
    }
    std::vector<double> xs;
    for (std::size_t i = 0; i < v.size(); ++i) {
        if (!v[i].is_number() || !std::isfinite(v[i].get<double>())) {
            reader.error(child(here, i), "expected a finite number, found " + describeType(v[i]));
            return;
        }
        xs.push_back(v[i].get<double>());
    }
    spec.arrays[std::string(p.name)] = std::move(xs);
}

void readOne(const Json &v, const ParamSchema &p, const std::string &here, Reader &reader,
             ModelSpec &spec) {
    const std::string name(p.name);
    switch (p.type) {
        case P::Scalar:
            if (!v.is_number() || !std::isfinite(v.get<double>())) {
                reader.error(here, "expected a finite number, found " + describeType(v));
            } else if (p.positive && v.get<double>() <= 0.0) {
                reader.error(here,
                             fmt::format("expected a positive number, found {}", v.get<double>()));
            } else {
                spec.scalars[name] = v.get<double>();
            }
            break;
        case P::Array:
            readArray(v, p, here, reader, spec);
            break;
        case P::String:
            if (v.is_string())
                spec.strings[name] = v.get<std::string>();
            else
                reader.error(here, "expected a string, found " + describeType(v));
            break;
        case P::Flag:
            if (v.is_boolean())
                spec.flags[name] = v.get<bool>();
            else
                reader.error(here, "expected true or false, found " + describeType(v));
            break;
    }
}

// Cross-parameter rules: arrays that go together, the allowed string values.
void checkCombination(const FormSchema &schema, const std::string &path, Reader &reader,
                      const ModelSpec &spec) {
    const auto a = spec.arrays.find("a");
    for (const char *partner : {"exponents", "b"}) {
        const auto it = spec.arrays.find(partner);
        if (a != spec.arrays.end() && it != spec.arrays.end() &&
            it->second.size() != a->second.size())
            reader.error(child(path, partner),
                         fmt::format("has {} entries but 'a' has {}; expected arrays of equal "
                                     "length",
                                     it->second.size(), a->second.size()));
    }
    if (schema.form == "wagner") {
        const bool hasList = spec.arrays.contains("exponents");
        const auto set = spec.strings.find("exponent_set");
        if (hasList == (set != spec.strings.end()))
            reader.error(path,
                         "model 'wagner' needs exactly one of 'exponents' and "
                         "'exponent_set'");
        if (set != spec.strings.end()) {
            if (set->second != "1-1.5-3-6" && set->second != "1-1.5-2.5-5")
                reader.error(child(path, "exponent_set"),
                             fmt::format("unknown exponent set '{}'; expected \"1-1.5-3-6\" or "
                                         "\"1-1.5-2.5-5\"",
                                         set->second));
            else if (a != spec.arrays.end() && a->second.size() != 4)
                reader.error(child(path, "a"),
                             fmt::format("has {} entries; exponent set '{}' needs 4",
                                         a->second.size(), set->second));
        }
    }
    const auto base = spec.strings.find("base");
    if (base != spec.strings.end() && base->second != "10" && base->second != "e")
        reader.error(
            child(path, "base"),
            fmt::format("unknown logarithm base '{}'; expected \"10\" or \"e\"", base->second));
}

}  // namespace

const FormSchema *findForm(std::string_view form) {
    const auto &all = schemas();
    const auto it =
        std::find_if(all.begin(), all.end(), [&](const FormSchema &s) { return s.form == form; });
    return it == all.end() ? nullptr : &*it;
}

std::string formList() {
    std::string s;
    for (const auto &f : schemas()) s += (s.empty() ? "" : ", ") + std::string(f.form);
    return s;
}

void readParameters(const Json &parameters, const FormSchema &schema, const std::string &path,
                    Reader &reader, ModelSpec &spec) {
    if (!reader.expectObject(parameters, path, "the model parameters")) return;
    for (const auto &[key, value] : parameters.items()) {
        const auto it = std::find_if(schema.params.begin(), schema.params.end(),
                                     [&k = key](const ParamSchema &p) { return p.name == k; });
        if (it == schema.params.end())
            reader.error(child(path, key),
                         fmt::format("unknown parameter '{}' for model '{}'; expected: {}", key,
                                     schema.form, paramList(schema)));
        else
            readOne(value, *it, child(path, key), reader, spec);
    }
    for (const auto &p : schema.params) {
        if (p.required && !parameters.contains(p.name))
            reader.error(child(path, p.name),
                         fmt::format("missing parameter '{}' ({}) of model '{}'", p.name,
                                     typeWord(p.type), schema.form));
    }
    checkCombination(schema, path, reader, spec);
}

}  // namespace pw::io
