# The version is written once, in lib/include/tubeheat.h (TH_VERSION_STRING
# and its parts); every CMake project of the tree (the main build and the
# standalone sanitizer projects in tests/) includes this file before
# project() and gets it as TH_VERSION.
get_filename_component(TH_ROOT ${CMAKE_CURRENT_LIST_DIR}/.. ABSOLUTE)
file(STRINGS ${TH_ROOT}/lib/include/tubeheat.h th_version_line
     REGEX "^#define TH_VERSION_STRING \"[0-9.]+\"")
string(REGEX MATCH "[0-9]+\\.[0-9]+\\.[0-9]+" TH_VERSION "${th_version_line}")
if(NOT TH_VERSION)
  message(FATAL_ERROR "TH_VERSION_STRING not found in lib/include/tubeheat.h")
endif()
