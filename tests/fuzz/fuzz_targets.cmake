# Fuzz targets (docs: DEVELOPERS.md, "Fuzzing and sanitizers"), included by cmake/Fuzz.cmake at
# the end of the top-level CMakeLists. Each target is one source file defining
# LLVMFuzzerTestOneInput; the programs go to <build>/tests/fuzz/.
# - PW_FUZZ=ON (clang): <name>_fuzz is a libFuzzer program (-fsanitize=fuzzer,address,undefined;
#   the rest of the project is instrumented by cmake/Fuzz.cmake); run it with
#   tests/fuzz/run-fuzzers.sh.
# - otherwise (gcc or clang): <name>_fuzz is a replay program (replay_main.cpp) that runs the
#   target once on each file given.
# In both builds ctest replays the seed corpus tests/fuzz/corpus/<name>/ (fuzz_replay_<name>).
set(PW_FUZZ_CORPUS ${CMAKE_CURRENT_LIST_DIR}/corpus)

function(pw_add_fuzz_target name)
  set(src ${CMAKE_CURRENT_LIST_DIR}/${name}_fuzz.cpp)
  if(PW_FUZZ)
    add_executable(${name}_fuzz ${src})
    target_compile_options(${name}_fuzz PRIVATE -fsanitize=fuzzer)
    target_link_options(${name}_fuzz PRIVATE -fsanitize=fuzzer,address,undefined)
    set(replay_args -runs=0 -detect_leaks=1)
  else()
    add_executable(${name}_fuzz ${src} ${CMAKE_CURRENT_LIST_DIR}/replay_main.cpp)
    set(replay_args)
  endif()
  target_include_directories(${name}_fuzz PRIVATE ${PROJECT_SOURCE_DIR})
  set_target_properties(${name}_fuzz PROPERTIES RUNTIME_OUTPUT_DIRECTORY
                                                ${PROJECT_BINARY_DIR}/tests/fuzz)
  target_link_libraries(${name}_fuzz PRIVATE ${ARGN} pw_warnings)
  add_test(NAME fuzz_replay_${name}
           COMMAND ${name}_fuzz ${replay_args} ${PW_FUZZ_CORPUS}/${name})
  set_tests_properties(fuzz_replay_${name} PROPERTIES LABELS fuzz)
endfunction()

pw_add_fuzz_target(csv phasewright_core)
pw_add_fuzz_target(units phasewright_core)
pw_add_fuzz_target(substance phasewright_core phasewright_resources)
pw_add_fuzz_target(run_log phasewright_core)
if(PW_BUILD_GUI)
  pw_add_fuzz_target(session phasewright_widgets Qt6::Core)
  set_tests_properties(fuzz_replay_session PROPERTIES ENVIRONMENT "QT_QPA_PLATFORM=offscreen")
endif()
