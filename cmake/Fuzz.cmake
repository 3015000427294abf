# Fuzz build (DEVELOPERS.md, "Fuzzing and sanitizers"). PW_FUZZ=ON needs clang: every target is
# compiled with libFuzzer's coverage instrumentation and AddressSanitizer + UBSan, and the fuzz
# programs in tests/fuzz link libFuzzer. Without PW_FUZZ the same targets are built as replay
# programs, so every build's ctest replays the seed corpus.
option(PW_FUZZ "Build the libFuzzer targets in tests/fuzz (clang only)" OFF)
if(PW_FUZZ)
  if(NOT CMAKE_CXX_COMPILER_ID MATCHES "Clang")
    message(FATAL_ERROR "PW_FUZZ=ON needs clang (cmake -DCMAKE_CXX_COMPILER=clang++ ...)")
  endif()
  add_compile_options(-fsanitize=fuzzer-no-link,address,undefined -fno-omit-frame-pointer
                      -fno-sanitize-recover=all -Wno-unknown-warning-option)
  add_link_options(-fsanitize=address,undefined)
endif()
# The fuzz targets are defined once the whole project is (they link the core and, with the GUI,
# the widgets) and testing is enabled: at the end of the top-level CMakeLists.
cmake_language(DEFER DIRECTORY ${PROJECT_SOURCE_DIR} CALL include
               ${PROJECT_SOURCE_DIR}/tests/fuzz/fuzz_targets.cmake)
