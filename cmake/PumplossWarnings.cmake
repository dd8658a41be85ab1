# Strict warnings for pumploss's own targets; errors with PUMPLOSS_WERROR=ON (CI).
function(pumploss_target_warnings target)
  if(MSVC)
    target_compile_options(${target} PRIVATE /W4 $<$<BOOL:${PUMPLOSS_WERROR}>:/WX>)
  else()
    target_compile_options(${target} PRIVATE
      -Wall -Wextra -Wpedantic -Wshadow -Wconversion -Wsign-conversion -Wdouble-promotion
      -Wold-style-cast -Wnon-virtual-dtor -Wcast-align -Wnull-dereference
      $<$<BOOL:${PUMPLOSS_WERROR}>:-Werror>)
  endif()
endfunction()

# Looser set for test and benchmark code, which includes third-party headers.
function(pumploss_test_warnings target)
  if(NOT MSVC)
    target_compile_options(${target} PRIVATE -Wall -Wextra -Wshadow
      $<$<BOOL:${PUMPLOSS_WERROR}>:-Werror>)
  endif()
endfunction()
