# Packages with CPack, from what `cmake --install` installs:
#   cpack -G DEB  in a shared Linux build: the libraries, headers, the program, the docs, the
#                 pkg-config and CMake package files (scripts/check.sh builds it, lists it and
#                 installs it into a scratch root);
#   cpack -G ZIP  in the Windows (mingw) build: pumploss.dll, its import library, the .def file,
#                 the header, the spreadsheet (VBA) module and the docs.
# Included by the top-level CMakeLists.txt when PUMPLOSS_INSTALL is on.
install(FILES README.md DESTINATION ${CMAKE_INSTALL_DOCDIR})
install(DIRECTORY docs/pages/ DESTINATION ${CMAKE_INSTALL_DOCDIR}/pages FILES_MATCHING PATTERN "*.md")
install(DIRECTORY docs/images/ DESTINATION ${CMAKE_INSTALL_DOCDIR}/images)
if(WIN32 AND DEFINED PUMPLOSS_DEF_FILE)
  install(FILES ${PUMPLOSS_DEF_FILE} DESTINATION ${CMAKE_INSTALL_LIBDIR})
endif()

set(CPACK_PACKAGE_NAME pumploss)
set(CPACK_PACKAGE_VENDOR "pumploss")
set(CPACK_PACKAGE_VERSION ${PROJECT_VERSION})
set(CPACK_PACKAGE_DESCRIPTION_SUMMARY "Hydraulic pump leakage and efficiency calculations: C++ library, C API and program")
set(CPACK_PACKAGE_DESCRIPTION "pumploss computes hydraulic pump and motor efficiencies with their uncertainty, leakage at other pressures and temperatures, gap and orifice flows, case drain line back pressure with cold start, leakage budgets and health verdicts. Results are engineering estimates; the pump maker's limits, local codes and licensed practice take precedence.")
set(CPACK_PACKAGE_CONTACT "pumploss maintainers <maintainers@pumploss.invalid>")
set(CPACK_RESOURCE_FILE_README ${PROJECT_SOURCE_DIR}/README.md)
set(CPACK_PACKAGE_CHECKSUM SHA256)
set(CPACK_STRIP_FILES ON)
if(WIN32)
  set(CPACK_GENERATOR ZIP)
  set(CPACK_SYSTEM_NAME win64)
  set(CPACK_INCLUDE_TOPLEVEL_DIRECTORY ON)
else()
  set(CPACK_GENERATOR DEB)
  set(CPACK_PACKAGING_INSTALL_PREFIX /usr)
  set(CPACK_DEBIAN_FILE_NAME DEB-DEFAULT)
  set(CPACK_DEBIAN_PACKAGE_SECTION science)
  set(CPACK_DEBIAN_PACKAGE_SHLIBDEPS ON)
  set(CPACK_DEBIAN_PACKAGE_GENERATE_SHLIBS ON)
endif()
include(CPack)
