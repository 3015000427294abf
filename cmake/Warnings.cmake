# Project-wide warning flags; PW_WERROR turns them into errors (CI does).
add_library(pw_warnings INTERFACE)
target_compile_options(pw_warnings INTERFACE -Wall -Wextra -Wpedantic -Wshadow=local
                       -Wnon-virtual-dtor -Wold-style-cast -Wcast-align -Woverloaded-virtual)
if(PW_WERROR)
  target_compile_options(pw_warnings INTERFACE -Werror)
endif()
if(PW_SANITIZE)
  add_compile_options(-fsanitize=address,undefined -fno-omit-frame-pointer -fno-sanitize-recover=all)
  add_link_options(-fsanitize=address,undefined)
endif()
