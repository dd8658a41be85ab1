! A Fortran 2003 caller of the pumploss C API through the generated ISO_C_BINDING module.
! Check values: see tests/reference/SOURCES.md (the same as tests/capi/c_caller.c).
program fortran_caller
  use, intrinsic :: iso_c_binding
  use, intrinsic :: ieee_arithmetic, only: ieee_is_nan, ieee_value, ieee_quiet_nan
  use pumploss
  implicit none
  integer :: checks = 0, failures = 0
  integer(c_int) :: st
  real(c_double) :: nu, a, b, mid, lo, hi, out, nan
  character(len=:), allocatable :: text

  ! version and messages through C strings
  text = pumploss_string(pumploss_version())
  call check(len(text) >= 5 .and. index(text, '.') > 0, 'version string')
  call check(pumploss_version_number() >= 0, 'version number')
  text = pumploss_string(pumploss_status_message(PUMPLOSS_EUNIT))
  call check(len(text) > 10, 'status message')

  ! NIST SP 811 (2008) B.8: 1 psi = 6.894757E+03 Pa
  st = pumploss_unit_convert(1.0_c_double, 'psi'//c_null_char, 'Pa'//c_null_char, out)
  call check(st == PUMPLOSS_OK .and. abs(out / 6894.757_c_double - 1) < 1e-7_c_double, 'psi to Pa')
  ! exact: -40 degC = -40 degF
  st = pumploss_unit_convert(-40.0_c_double, 'degC'//c_null_char, 'degF'//c_null_char, out)
  call check(st == PUMPLOSS_OK .and. abs(out + 40) < 1e-12_c_double, '-40 degC to degF')
  st = pumploss_unit_convert(1.0_c_double, 'bar'//c_null_char, 'L/min'//c_null_char, out)
  call check(st == PUMPLOSS_EDIMENSION .and. ieee_is_nan(out), 'bar to L/min refused')

  ! ASTM D341 worked example: 32 and 5.4 mm2/s at 40 and 100 degC give 8.5 mm2/s at 80 degC
  st = pumploss_viscosity_d341(313.15_c_double, 32e-6_c_double, 373.15_c_double, 5.4e-6_c_double, &
                               353.15_c_double, nu)
  call check(st == PUMPLOSS_OK .and. abs(nu - 8.53e-6_c_double) < 0.01e-6_c_double, 'D341 example')
  nan = ieee_value(nan, ieee_quiet_nan)
  st = pumploss_viscosity_d341(nan, 32e-6_c_double, 373.15_c_double, 5.4e-6_c_double, 353.15_c_double, nu)
  call check(st == PUMPLOSS_ENONFINITE .and. ieee_is_nan(nu), 'D341 NaN input')
  st = pumploss_d341_coefficients(313.0_c_double, 32e-6_c_double, 373.0_c_double, 5.4e-6_c_double, a, b)
  call check(st == PUMPLOSS_OK .and. abs(a - 9.5259_c_double) < 1e-4_c_double &
             .and. abs(b - 3.7449_c_double) < 1e-4_c_double, 'D341 coefficients')

  ! ISO 3448:1992: VG 46 spans 41.4 to 50.6 mm2/s
  st = pumploss_iso_vg(46_c_int, mid, lo, hi)
  call check(st == PUMPLOSS_OK .and. abs(lo / 41.4e-6_c_double - 1) < 1e-12_c_double &
             .and. abs(hi / 50.6e-6_c_double - 1) < 1e-12_c_double, 'ISO VG 46')
  st = pumploss_iso_vg(47_c_int, mid, lo, hi)
  call check(st == PUMPLOSS_EDOMAIN .and. ieee_is_nan(mid) .and. ieee_is_nan(hi), 'ISO VG 47 refused')

  deallocate(text)
  write (*, '(I0, A, I0, A)') checks - failures, ' passed, ', failures, ' failed'
  if (failures /= 0) error stop 1

contains

  subroutine check(cond, what)
    logical, intent(in) :: cond
    character(len=*), intent(in) :: what
    checks = checks + 1
    if (.not. cond) then
      failures = failures + 1
      write (*, '(A, A)') 'FAIL: ', what
    end if
  end subroutine check

end program fortran_caller
