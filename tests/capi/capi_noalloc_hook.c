/* Counting allocator for capi_noalloc (glibc): the executable's malloc family interposes the
 * C library's for the whole process, including libpumploss and libstdc++, and counts calls
 * while pl_alloc_armed is set. Memory itself comes from glibc's __libc_* functions. */
#include <stddef.h>

void *__libc_malloc(size_t n);
void *__libc_calloc(size_t n, size_t size);
void *__libc_realloc(void *p, size_t n);
void __libc_free(void *p);

volatile int pl_alloc_armed = 0;
volatile long pl_alloc_count = 0;

void *malloc(size_t n) {
  if (pl_alloc_armed) ++pl_alloc_count;
  return __libc_malloc(n);
}
void *calloc(size_t n, size_t size) {
  if (pl_alloc_armed) ++pl_alloc_count;
  return __libc_calloc(n, size);
}
void *realloc(void *p, size_t n) {
  if (pl_alloc_armed) ++pl_alloc_count;
  return __libc_realloc(p, n);
}
void free(void *p) { __libc_free(p); }
