# Shared by the standalone sanitizer projects (tests/fuzz, tests/tsan), which
# build the library from the project's own lib/CMakeLists.txt so that it keeps
# every definition and link option of the real build. Each project sets its
# instrumentation with add_compile_options()/add_link_options() first, then
# calls th_add_sanitized_library().
macro(th_add_sanitized_library)
  set(CMAKE_CXX_STANDARD 17)
  set(CMAKE_CXX_STANDARD_REQUIRED ON)
  set(CMAKE_CXX_EXTENSIONS OFF)
  if(NOT CMAKE_BUILD_TYPE)
    set(CMAKE_BUILD_TYPE RelWithDebInfo CACHE STRING "Build type" FORCE)
  endif()
  # What lib/CMakeLists.txt expects from the top-level project. TH_SANITIZE
  # drops _FORTIFY_SOURCE, which does not mix with the sanitizers'
  # interceptors.
  set(TH_WARNINGS -Wall -Wextra -Wno-sign-conversion)
  set(TH_SANITIZE ON)
  add_subdirectory(${TH_ROOT}/lib ${CMAKE_BINARY_DIR}/lib)
endmacro()
