/// @file export.hpp
/// @brief PUMPLOSS_CXX_API: marks the few C++ functions compiled into the pumploss_cxx library
/// (src/*.cpp), so a shared build exports exactly these and hides everything else.
///
/// The switches are compile definitions, set by CMake (and by pumploss-cxx.pc):
/// - PUMPLOSS_CXX_SHARED: pumploss_cxx is a shared library (users and the library itself);
/// - PUMPLOSS_CXX_BUILDING: this translation unit is part of pumploss_cxx.
/// Neither is defined for a static library: the macro is then empty. Every other function of
/// the header core is a template or inline and is compiled in the user's program.
#ifndef PUMPLOSS_EXPORT_HPP
#define PUMPLOSS_EXPORT_HPP

#ifndef PUMPLOSS_CXX_API
#if defined(PUMPLOSS_CXX_SHARED) && (defined(_WIN32) || defined(__CYGWIN__))
#if defined(PUMPLOSS_CXX_BUILDING)
#define PUMPLOSS_CXX_API __declspec(dllexport)
#else
#define PUMPLOSS_CXX_API __declspec(dllimport)
#endif
#elif defined(PUMPLOSS_CXX_SHARED) && defined(__GNUC__)
#define PUMPLOSS_CXX_API __attribute__((visibility("default")))
#else
#define PUMPLOSS_CXX_API
#endif
#endif

#endif
