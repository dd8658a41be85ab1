/* pumploss.h compiled on its own as strict C (C89, C99, C11). */
#include "pumploss.h"

int pumploss_header_compile_check(void);
int pumploss_header_compile_check(void) { return PUMPLOSS_OK + PUMPLOSS_VERSION_NUMBER; }
