# The bindings of the C API, generated from capi/include/pumploss.h at build time by
# tools/capigen/capigen.py (pumploss.h is their one source; tests/capi/exports.txt is the one
# hand-kept ABI snapshot, checked against them by the capi_exports test):
#   pumploss.def            Windows exports of pumploss.dll (used by the Windows link)
#   ctypes signatures       the table module read by the Python package (python/pumploss)
#   pumploss.f90            Fortran 2003 module (ISO_C_BINDING)
#   pumploss.bas            VBA module for 64-bit spreadsheet hosts
# Needs a Python 3 interpreter at build time (standard library only).
find_program(PUMPLOSS_CAPIGEN_PYTHON NAMES python3 python REQUIRED
  DOC "Python 3 that runs tools/capigen/capigen.py at build time")
set(PUMPLOSS_CAPIGEN ${PROJECT_SOURCE_DIR}/tools/capigen/capigen.py)
set(PUMPLOSS_CAPI_HEADER ${PROJECT_SOURCE_DIR}/capi/include/pumploss.h)
set(PUMPLOSS_BINDINGS_DIR ${PROJECT_BINARY_DIR}/bindings)
set(PUMPLOSS_DEF_FILE ${PUMPLOSS_BINDINGS_DIR}/pumploss.def)
set(PUMPLOSS_PY_SIGNATURES ${PUMPLOSS_BINDINGS_DIR}/pumploss_signatures.py)
set(PUMPLOSS_F90_FILE ${PUMPLOSS_BINDINGS_DIR}/pumploss.f90)
set(PUMPLOSS_BAS_FILE ${PUMPLOSS_BINDINGS_DIR}/pumploss.bas)
add_custom_command(
  OUTPUT ${PUMPLOSS_DEF_FILE} ${PUMPLOSS_PY_SIGNATURES} ${PUMPLOSS_F90_FILE} ${PUMPLOSS_BAS_FILE}
  COMMAND ${PUMPLOSS_CAPIGEN_PYTHON} ${PUMPLOSS_CAPIGEN} all ${PUMPLOSS_CAPI_HEADER} ${PUMPLOSS_BINDINGS_DIR}
  DEPENDS ${PUMPLOSS_CAPIGEN} ${PROJECT_SOURCE_DIR}/tools/capigen/pumploss.bas.in ${PUMPLOSS_CAPI_HEADER}
  COMMENT "Generating the C API bindings (.def, ctypes, Fortran, VBA) from pumploss.h"
  VERBATIM)
add_custom_target(pumploss_bindings ALL
  DEPENDS ${PUMPLOSS_DEF_FILE} ${PUMPLOSS_PY_SIGNATURES} ${PUMPLOSS_F90_FILE} ${PUMPLOSS_BAS_FILE})
