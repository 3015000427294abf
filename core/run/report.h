#pragma once
// A run's (or a plan's) events and rule verdicts as one CSV table, written atomically.
//
// Columns: record,id,result,time_s,index,T_K,P_Pa,from,to,detail
//   record  "event" or "rule"
//   id      the transition ("sublimation") or the rule id
//   result  events: empty; rules: pass | fail | no_data
//   time_s  event time, or the first violating time (empty when the rule passed)
//   from,to events: the phases on either side; rules: empty
#include <span>
#include <string>
#include <string_view>
#include <vector>

#include "core/path.h"
#include "core/run/rules.h"

namespace pw::run {

std::string eventsAndVerdictsCsv(const PathResult &analysis,
                                 const std::vector<RuleVerdict> &verdicts);

// Writes `content` to a temporary file beside `path` and renames it over `path`; on any
// error the temporary file is removed, `path` is left untouched and pw::Error is thrown.
void writeFileAtomically(const std::string &path, std::string_view content);

void writeEventsAndVerdictsCsv(const std::string &path, const PathResult &analysis,
                               const std::vector<RuleVerdict> &verdicts);

}  // namespace pw::run
