/**
 * @file pumploss.h
 * @brief The pumploss C API: hydraulic pump leakage and efficiency calculations as plain C
 * functions.
 *
 * This header is the contract: anything not declared here is not public API. It compiles as
 * C89, C99, C11 and C++, and includes nothing but <stddef.h>.
 *
 * Conventions (every function):
 * - Units are SI and are part of each parameter name (dp_pa, mu_pa_s, q_m3_s, n_rev_s, t_k).
 *   Use pumploss_unit_convert() at the edges.
 * - The return value is a status code (PUMPLOSS_OK = 0). Results go out through pointers.
 * - Codes 1-99 are errors (PUMPLOSS_IS_ERROR(st)): every non-NULL output is set to a quiet NaN,
 *   so a spreadsheet shows an error rather than a wrong number; the one exception is
 *   PUMPLOSS_EPARTIAL of a batch function, where the elements whose own status is OK or a
 *   report keep their values. Codes 100 and up are reports (PUMPLOSS_IS_REPORT(st)): every
 *   output is usable and finite, but was computed outside a stated assumption (e.g.
 *   PUMPLOSS_WREGIME); the one exception is PUMPLOSS_WUNDEFINED, where an output the
 *   function documents as undefined for those inputs is NaN. A usable status never comes with
 *   an infinite output. Test with the macros, not with number ranges.
 * - A NULL output pointer is an error (PUMPLOSS_EMISUSE), never a crash.
 * - Arrays and counts: every array length and every count (given in, or out through a pointer,
 *   as pumploss_standard_bore_count() does) is a size_t. An int is kept where the number is not
 *   the length of an array: the number of pistons of pumploss_piston_pump_create() (a physical
 *   design figure, 3 to 15) and element indexes of a line, where an output uses -1 for "none"
 *   (pumploss_line_size_drain_flow()'s dominant_element). NULL is never a valid array, whatever
 *   the count: a NULL array gives PUMPLOSS_EMISUSE, also with n = 0. With valid arrays and
 *   n = 0 a batch function returns PUMPLOSS_OK and writes nothing; a function that needs data
 *   (a fit, a calibration, a check over temperatures) returns its documented error for too few
 *   points (PUMPLOSS_EDATA or PUMPLOSS_EDOMAIN). Counts are checked before a handle's state:
 *   n = 0 gives that answer also on a handle that is not configured yet (a line without its
 *   oil, a health handle without its description).
 * - Every int parameter that selects a mode, method or kind has named constants
 *   (PUMPLOSS_PUMP, PUMPLOSS_MODEL_WILSON, PUMPLOSS_PATH_SLIPPER, ...): use the names.
 * - No global mutable state: every function is reentrant and safe to call from many threads.
 *   Scalar functions do not allocate.
 * - Handles (opaque pointers, one contract for every kind): a handle is changed only by its
 *   create, set_ / add_ / calibrate functions (they take a non-const pointer); every other
 *   function takes a const pointer and never writes the handle, not even a message or a cache.
 *   So any number of threads may evaluate one shared handle at once, with no locking, as long
 *   as no thread changes it meanwhile; changing a handle needs exclusive use (configure it,
 *   then share it). Messages go into caller buffers or are fixed when the handle is changed.
 *   Destroying NULL is a no-op. (Tested: tests/capi/capi_shared_handles.cpp, eight threads on
 *   one handle of every kind under ThreadSanitizer.)
 * - Every call masks floating-point traps on entry and restores the caller's floating-point
 *   environment on exit, so hosts that run with traps enabled are not disturbed.
 * - New status codes and functions may be added in minor versions; existing ones never change.
 *   A changed signature becomes a new function with a _v2 suffix.
 *
 * Results are engineering estimates. They do not replace the pump maker's data and limits,
 * local codes or licensed engineering practice.
 */
#ifndef PUMPLOSS_H
#define PUMPLOSS_H

#include <stddef.h>

/* Export macro: overridable. Shared builds define PUMPLOSS_SHARED (users) and
 * PUMPLOSS_BUILDING (the library itself). */
#ifndef PUMPLOSS_API
#if defined(_WIN32) || defined(__CYGWIN__)
#if defined(PUMPLOSS_SHARED) && defined(PUMPLOSS_BUILDING)
#define PUMPLOSS_API __declspec(dllexport)
#elif defined(PUMPLOSS_SHARED)
#define PUMPLOSS_API __declspec(dllimport)
#else
#define PUMPLOSS_API
#endif
#elif defined(__GNUC__) && __GNUC__ >= 4
#define PUMPLOSS_API __attribute__((visibility("default")))
#else
#define PUMPLOSS_API
#endif
#endif

/* Calling convention: empty, except __stdcall for a 32-bit Windows build with
 * PUMPLOSS_STDCALL defined (32-bit spreadsheet hosts). Overridable. */
#ifndef PUMPLOSS_CALL
#if defined(PUMPLOSS_STDCALL) && defined(_WIN32) && !defined(_WIN64)
#define PUMPLOSS_CALL __stdcall
#else
#define PUMPLOSS_CALL
#endif
#endif

#ifdef __cplusplus
extern "C" {
#endif

/** @name Version
 *  The header's version; pumploss_version() gives the library's, so a DLL user can check
 *  that the two agree. @{ */
#define PUMPLOSS_VERSION_MAJOR 0  /**< Major version (ABI changes only here). */
#define PUMPLOSS_VERSION_MINOR 1  /**< Minor version. */
#define PUMPLOSS_VERSION_PATCH 0  /**< Patch version. */
#define PUMPLOSS_VERSION "0.1.0"  /**< "MAJOR.MINOR.PATCH". */
/** MAJOR*1000000 + MINOR*1000 + PATCH. */
#define PUMPLOSS_VERSION_NUMBER 1000

/** The library version.
 *  @return "MAJOR.MINOR.PATCH" (static string, never NULL, never to be freed). */
PUMPLOSS_API const char *PUMPLOSS_CALL pumploss_version(void);
/** The library version as a number.
 *  @return MAJOR*1000000 + MINOR*1000 + PATCH. */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_version_number(void);
/** @} */

/** @name Status codes
 *  0 is success; 1-99 are errors (outputs NaN); 100 and up are reports (outputs valid and
 *  finite, see PUMPLOSS_WUNDEFINED). Test with PUMPLOSS_IS_ERROR() and PUMPLOSS_IS_REPORT().
 *  Numbers are fixed forever; new codes may be added. @{ */
#define PUMPLOSS_OK 0                 /**< Success. */
#define PUMPLOSS_EDOMAIN 1            /**< An argument is outside its physical domain. */
#define PUMPLOSS_ENONFINITE 2         /**< An argument is NaN or infinite. */
#define PUMPLOSS_EOVERFLOW 3          /**< The result is not representable. */
#define PUMPLOSS_ENOCONVERGE 4        /**< An iteration reached its cap. */
#define PUMPLOSS_EMISUSE 5            /**< A NULL pointer or a bad handle. */
#define PUMPLOSS_EUNIT 6              /**< Unknown unit symbol. */
#define PUMPLOSS_EDIMENSION 7         /**< Units of different quantities. */
#define PUMPLOSS_EBUFFER 8            /**< Output buffer too small. */
#define PUMPLOSS_ENOMEM 9             /**< Out of memory. */
#define PUMPLOSS_EINTERNAL 10         /**< Internal error (a bug). */
#define PUMPLOSS_EVALIDITY 11         /**< Inputs outside the range where the method is defined. */
#define PUMPLOSS_EDATA 12             /**< Too few or degenerate data points. */
/** Batch: some elements failed. An error, so that a caller testing only the summary never
 *  uses a NaN; the per-element status array tells which elements hold usable values (those
 *  elements keep them, the failed ones are NaN). Replaces the retired PUMPLOSS_WPARTIAL. */
#define PUMPLOSS_EPARTIAL 13
#define PUMPLOSS_WREGIME 100          /**< Valid, but outside the model's assumptions. */
#define PUMPLOSS_WTRANSITION 101      /**< Valid, in the laminar-turbulent transition region. */
#define PUMPLOSS_WILLCONDITIONED 102  /**< Valid, but the fit is ill-conditioned. */
#define PUMPLOSS_WEXTRAPOLATED 103    /**< Valid, extrapolated beyond data or table. */
/** Retired: never returned. Was "batch: some elements failed", a report code that came with
 *  NaN outputs; batch functions return PUMPLOSS_EPARTIAL instead. The number stays reserved. */
#define PUMPLOSS_WPARTIAL 104
#define PUMPLOSS_WIMPLAUSIBLE 105     /**< Valid, but physically implausible (e.g. efficiency > 1). */
/** Valid, but an output that is undefined for these inputs is NaN: only an output whose
 *  documentation says so (e.g. the friction factor of pumploss_pipe_flow() at zero flow, the
 *  gap change of a calibration group without a gap); every other output is usable and finite.
 *  The one report that may come with a NaN output. */
#define PUMPLOSS_WUNDEFINED 106
/** Valid, but some data points failed an outlier test: they are flagged (and excluded from a fit
 *  where the rule says so); e.g. the set points of pumploss_test_stand_create(). */
#define PUMPLOSS_WOUTLIER 107

/** True for an error status (1-99): the outputs are NaN (see PUMPLOSS_EPARTIAL for batches). */
#define PUMPLOSS_IS_ERROR(st) ((st) > 0 && (st) < 100)
/** True for a report status (100 and up): the outputs are usable, computed outside a stated
 *  assumption. PUMPLOSS_OK is neither an error nor a report. */
#define PUMPLOSS_IS_REPORT(st) ((st) >= 100)

/** A one-sentence English description of a status code.
 *  @param status a status code returned by any pumploss function
 *  @return the sentence; a sentence saying the code is unknown for any other number.
 *          Static storage: never NULL, never to be freed. */
PUMPLOSS_API const char *PUMPLOSS_CALL pumploss_status_message(int status);
/** @} */

/* ==== units ==== */
/** @name Units
 *  @{ */
/**
 * Convert a value between two units of the same quantity.
 *
 * Symbols are case-sensitive: pressure `Pa kPa MPa GPa bar mbar psi`; volume flow
 * `m3/s L/min L/s m3/h cm3/s gpm` (US gallon); volume `m3 cm3 L in3 gal`; displacement
 * `m3/rev cm3/rev in3/rev`; dynamic viscosity `Pa.s mPa.s cP`; kinematic viscosity
 * `m2/s mm2/s cSt`; temperature `K degC degF`; power `W kW hp` (mechanical); torque
 * `N.m lbf.ft lbf.in`; speed `rev/s rev/min rpm rad/s`; length `m cm mm um in ft`; density
 * `kg/m3 g/cm3`; velocity `m/s ft/s`; mass flow `kg/s kg/h`; specific heat `J/(kg.K) kJ/(kg.K)`;
 * force `N kN lbf`. Factors are exact (NIST SP 811).
 *
 * @param value     the value in from_unit (finite)
 * @param from_unit symbol of the value's unit (UTF-8, NUL-terminated)
 * @param to_unit   symbol of the wanted unit
 * @param out       receives the converted value
 * @return PUMPLOSS_OK; PUMPLOSS_EUNIT for an unknown symbol; PUMPLOSS_EDIMENSION for units of
 *         different quantities; PUMPLOSS_EDOMAIN for a temperature below absolute zero (the
 *         temperature units are absolute, not differences); PUMPLOSS_ENONFINITE for NaN/inf;
 *         PUMPLOSS_EMISUSE for NULL.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_unit_convert(double value, const char *from_unit,
                                                     const char *to_unit, double *out);
/** @} */

/* ==== fluid ==== */
/** @name Oil properties
 *  @{ */
/**
 * Kinematic viscosity at t_k from two known points by ASTM D341 (Walther/MacCoull),
 * with the standard's low-viscosity term below 2 mm^2/s.
 * @param t1_k first temperature, K (> 0)
 * @param nu1_m2_s kinematic viscosity at t1_k, m^2/s (> 0)
 * @param t2_k second temperature, K (> 0, != t1_k)
 * @param nu2_m2_s kinematic viscosity at t2_k, m^2/s (> 0, viscosity falls with temperature)
 * @param t_k wanted temperature, K (> 0)
 * @param nu_m2_s receives the kinematic viscosity, m^2/s
 * @return PUMPLOSS_OK, PUMPLOSS_WREGIME (result below 0.2 mm^2/s), PUMPLOSS_EDOMAIN,
 *         PUMPLOSS_ENONFINITE, PUMPLOSS_EOVERFLOW, PUMPLOSS_EMISUSE.
 * @sa pumploss::viscosity_d341
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_viscosity_d341(double t1_k, double nu1_m2_s, double t2_k,
                                                       double nu2_m2_s, double t_k, double *nu_m2_s);
/**
 * Constants A and B of the ASTM D341 line log10(log10(Z)) = A - B log10(T) through two points.
 * @param t1_k, nu1_m2_s first point (K, m^2/s)
 * @param t2_k, nu2_m2_s second point (K, m^2/s)
 * @param a receives A
 * @param b receives B
 * @return as pumploss_viscosity_d341(). @sa pumploss::d341_fit
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_d341_coefficients(double t1_k, double nu1_m2_s, double t2_k,
                                                          double nu2_m2_s, double *a, double *b);
/**
 * Temperature at which an oil on the ASTM D341 line (A, B) reaches a kinematic viscosity: the
 * closed-form inverse of the D341 relation (e.g. the lowest start temperature for a maker's
 * largest start viscosity).
 * @param a A of pumploss_d341_coefficients()
 * @param b B, > 0
 * @param nu_m2_s kinematic viscosity, m^2/s, > 0 (above about 0.2 mm^2/s)
 * @param t_k receives the temperature, K
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE. @sa pumploss::d341_temperature
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_d341_temperature(double a, double b, double nu_m2_s, double *t_k);
/**
 * ISO 3448 viscosity grade: mid-point and +/-10 % limits of kinematic viscosity at 40 degC.
 * @param grade VG number (2, 3, 5, 7, 10, 15, 22, 32, 46, 68, 100, 150, 220, 320, 460, 680,
 *        1000, 1500)
 * @param mid_m2_s receives the mid-point, m^2/s
 * @param min_m2_s receives the lower limit, m^2/s
 * @param max_m2_s receives the upper limit, m^2/s
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN for an unknown grade. @sa pumploss::iso_vg
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_iso_vg(int grade, double *mid_m2_s, double *min_m2_s,
                                               double *max_m2_s);
/**
 * Saybolt Universal Seconds at 100 degF from kinematic viscosity at 100 degF (ASTM D2161).
 * @param nu_m2_s kinematic viscosity, m^2/s (> 0)
 * @param sus receives SUS, s
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME below 1.8 mm^2/s. @sa pumploss::sus_from_kinematic
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_sus_from_kinematic(double nu_m2_s, double *sus);
/**
 * Kinematic viscosity at 100 degF from Saybolt Universal Seconds at 100 degF (ASTM D2161).
 * @param sus Saybolt Universal Seconds (> 0)
 * @param nu_m2_s receives the kinematic viscosity, m^2/s
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME below 32 SUS. @sa pumploss::kinematic_from_sus
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_kinematic_from_sus(double sus, double *nu_m2_s);
/**
 * Dynamic viscosity mu = rho * nu.
 * @param nu_m2_s kinematic viscosity, m^2/s (> 0)
 * @param rho_kg_m3 density, kg/m^3 (> 0)
 * @param mu_pa_s receives the dynamic viscosity, Pa s
 * @return PUMPLOSS_OK or an error. @sa pumploss::dynamic_viscosity
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_dynamic_viscosity(double nu_m2_s, double rho_kg_m3,
                                                          double *mu_pa_s);
/**
 * Kinematic viscosity nu = mu / rho.
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param rho_kg_m3 density, kg/m^3 (> 0)
 * @param nu_m2_s receives the kinematic viscosity, m^2/s
 * @return PUMPLOSS_OK or an error. @sa pumploss::kinematic_viscosity
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_kinematic_viscosity(double mu_pa_s, double rho_kg_m3,
                                                            double *nu_m2_s);
/**
 * Oil density at temperature and gauge pressure:
 * rho = rho_ref (1 - alpha (T - T_ref)) / (1 - p / K).
 * @param rho_ref_kg_m3 density at t_ref_k and zero gauge pressure, kg/m^3 (> 0)
 * @param t_ref_k reference temperature, K (> 0)
 * @param alpha_per_k cubic expansion coefficient, 1/K (>= 0)
 * @param bulk_modulus_pa secant bulk modulus, Pa (> 0)
 * @param t_k temperature, K (> 0)
 * @param p_pa gauge pressure, Pa (|p| < K)
 * @param rho_kg_m3 receives the density, kg/m^3
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME more than 150 K from the reference. @sa pumploss::oil_density
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_oil_density(double rho_ref_kg_m3, double t_ref_k,
                                                    double alpha_per_k, double bulk_modulus_pa,
                                                    double t_k, double p_pa, double *rho_kg_m3);
/**
 * Barus pressure-viscosity relation mu = mu0 exp(alpha p).
 * @param mu0_pa_s viscosity at zero gauge pressure, Pa s (> 0)
 * @param alpha_per_pa pressure-viscosity coefficient, 1/Pa (>= 0)
 * @param p_pa gauge pressure, Pa (>= 0)
 * @param mu_pa_s receives the viscosity, Pa s
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME above 100 MPa. @sa pumploss::viscosity_barus
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_viscosity_barus(double mu0_pa_s, double alpha_per_pa,
                                                        double p_pa, double *mu_pa_s);
/**
 * Typical property set of a mineral hydraulic oil (see pumploss::typical_mineral_oil for the
 * sources of each value). Use the oil maker's data where it is at hand.
 * @param rho_kg_m3 receives the density at t_ref_k, kg/m^3
 * @param t_ref_k receives the reference temperature, K
 * @param alpha_per_k receives the cubic expansion coefficient, 1/K
 * @param bulk_modulus_pa receives the secant bulk modulus, Pa
 * @param cp_j_kg_k receives the specific heat, J/(kg K)
 * @param barus_per_pa receives the Barus coefficient, 1/Pa
 * @return PUMPLOSS_OK or PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_typical_mineral_oil(double *rho_kg_m3, double *t_ref_k,
                                                            double *alpha_per_k, double *bulk_modulus_pa,
                                                            double *cp_j_kg_k, double *barus_per_pa);
/** @} */

/* ==== gap ==== */
/** @name Clearance (gap) flows and orifices
 *  Laminar gap flows (plates, annulus, radial), hydrostatic pads, orifices and capillaries.
 *  Units SI as in the parameter names. @{ */
/**
 * Parallel-plate gap leakage with a moving wall: q = b h^3 dp/(12 mu L) + b h U/2.
 * @param dp_pa pressure drop along the gap, Pa
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param width_m gap width across the flow, m (> 0)
 * @param height_m gap height, m (> 0)
 * @param length_m gap length in the flow direction, m (> 0)
 * @param wall_speed_m_s speed of the moving wall along the flow, m/s
 * @param q_m3_s receives the leakage flow, m^3/s
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN (mu, width, height or length <= 0); PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE (NULL output).
 * @sa pumploss::gap_plates_flow
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_plates_flow(double dp_pa, double mu_pa_s, double width_m, double height_m, double length_m, double wall_speed_m_s, double *q_m3_s);
/**
 * Gap height that explains a measured parallel-plate leakage (pressure flow only): h = (12 mu L q/(b dp))^(1/3).
 * @param q_m3_s measured leakage, m^3/s (same sign as dp_pa, nonzero)
 * @param dp_pa pressure drop, Pa (nonzero)
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param width_m gap width, m (> 0)
 * @param length_m gap length, m (> 0)
 * @param height_m receives the gap height, m
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN (q and dp of different sign or zero, bad geometry); PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::gap_plates_height
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_plates_height(double q_m3_s, double dp_pa, double mu_pa_s, double width_m, double length_m, double *height_m);
/**
 * Gap height from leakage with the Couette term: the unique positive root of b dp h^3/(12 mu L) + b U h/2 = q, in closed form.
 * @param q_m3_s measured leakage, m^3/s (> 0)
 * @param dp_pa pressure drop, Pa (>= 0)
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param width_m gap width, m (> 0)
 * @param length_m gap length, m (> 0)
 * @param wall_speed_m_s wall speed along the flow, m/s
 * @param height_m receives the gap height, m
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN (no positive gap gives q); PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::gap_plates_height_couette
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_plates_height_couette(double q_m3_s, double dp_pa, double mu_pa_s, double width_m, double length_m, double wall_speed_m_s, double *height_m);
/**
 * Velocity profile of the parallel-plate gap: u(y) = dp/(2 mu L) y (h - y) + U y/h.
 * @param dp_pa pressure drop along the gap, Pa
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param height_m gap height, m (> 0)
 * @param length_m gap length, m (> 0)
 * @param wall_speed_m_s speed of the wall at y = h, m/s
 * @param y_m distance from the fixed wall, m (0..height_m)
 * @param u_m_s receives the velocity, m/s
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN (y outside the gap, bad geometry); PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::gap_plates_velocity
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_plates_velocity(double dp_pa, double mu_pa_s, double height_m, double length_m, double wall_speed_m_s, double y_m, double *u_m_s);
/**
 * Viscous friction force of a parallel-plate gap: F = mu U b L/h - b h dp/2.
 * @param dp_pa pressure drop along the gap in the direction of the wall motion, Pa
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param width_m gap width, m (> 0)
 * @param height_m gap height, m (> 0)
 * @param length_m gap length, m (> 0)
 * @param wall_speed_m_s wall speed, m/s
 * @param force_n receives the force needed to move the wall (positive when it opposes the motion), N
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::gap_plates_shear_force
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_plates_shear_force(double dp_pa, double mu_pa_s, double width_m, double height_m, double length_m, double wall_speed_m_s, double *force_n);
/**
 * Power lost in a parallel-plate gap: P = b h^3 dp^2/(12 mu L) + mu U^2 b L/h.
 * @param dp_pa pressure drop along the gap, Pa
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param width_m gap width, m (> 0)
 * @param height_m gap height, m (> 0)
 * @param length_m gap length, m (> 0)
 * @param wall_speed_m_s wall speed, m/s
 * @param power_w receives the dissipated power (leakage plus friction), W
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::gap_plates_power_loss
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_plates_power_loss(double dp_pa, double mu_pa_s, double width_m, double height_m, double length_m, double wall_speed_m_s, double *power_w);
/**
 * Exact laminar leakage through an eccentric annulus (piston in bore), any clearance, eccentricity 0..1 inclusive; relative error below 1e-12.
 * @param dp_pa pressure drop along the piston, Pa
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param bore_diameter_m bore diameter, m (> piston diameter)
 * @param piston_diameter_m piston diameter, m (> 0)
 * @param length_m sealing length, m (> 0)
 * @param eccentricity_ratio centre offset / radial clearance, 0 (concentric) to 1 (touching)
 * @param q_m3_s receives the leakage flow, m^3/s
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN (piston >= bore, eccentricity outside [0, 1], mu or length <= 0); PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::gap_annulus_flow
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_annulus_flow(double dp_pa, double mu_pa_s, double bore_diameter_m, double piston_diameter_m, double length_m, double eccentricity_ratio, double *q_m3_s);
/**
 * Narrow-gap annulus leakage q = pi D_m h^3 dp (1 + 1.5 eps^2)/(12 mu L), D_m the mean diameter (for comparison with the exact form).
 * @param dp_pa pressure drop, Pa
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param bore_diameter_m bore diameter, m (> piston diameter)
 * @param piston_diameter_m piston diameter, m (> 0)
 * @param length_m sealing length, m (> 0)
 * @param eccentricity_ratio eccentricity ratio, 0..1
 * @param q_m3_s receives the leakage flow, m^3/s
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME (clearance/radius > 0.05); errors as pumploss_gap_annulus_flow().
 * @sa pumploss::gap_annulus_narrow_flow
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_annulus_narrow_flow(double dp_pa, double mu_pa_s, double bore_diameter_m, double piston_diameter_m, double length_m, double eccentricity_ratio, double *q_m3_s);
/**
 * Exact axial drag flow of a piston sliding in an eccentric annulus (no pressure difference).
 * @param bore_diameter_m bore diameter, m (> piston diameter)
 * @param piston_diameter_m piston diameter, m (> 0)
 * @param eccentricity_ratio eccentricity ratio, 0..1
 * @param piston_speed_m_s piston speed relative to the bore, m/s
 * @param q_m3_s receives the drag flow, m^3/s (sign of the speed)
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::gap_annulus_drag_flow
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_annulus_drag_flow(double bore_diameter_m, double piston_diameter_m, double eccentricity_ratio, double piston_speed_m_s, double *q_m3_s);
/**
 * Leakage past a piston: exact eccentric pressure flow plus the drag flow of the sliding piston.
 * @param dp_pa pressure drop from displacement chamber to case, Pa
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param bore_diameter_m bore diameter, m
 * @param piston_diameter_m piston diameter, m
 * @param length_m sealing length, m (> 0)
 * @param eccentricity_ratio eccentricity ratio, 0..1
 * @param piston_speed_m_s piston speed, m/s, positive towards the case
 * @param q_m3_s receives pressure plus drag leakage, m^3/s
 * @return As pumploss_gap_annulus_flow().
 * @sa pumploss::gap_piston_leakage
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_piston_leakage(double dp_pa, double mu_pa_s, double bore_diameter_m, double piston_diameter_m, double length_m, double eccentricity_ratio, double piston_speed_m_s, double *q_m3_s);
/**
 * Radial clearance of an annulus that explains a measured leakage (inverse of pumploss_gap_annulus_flow()).
 * @param q_m3_s measured leakage, m^3/s (same sign as dp_pa)
 * @param dp_pa pressure drop, Pa (nonzero)
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param bore_diameter_m bore diameter, m (> 0)
 * @param length_m sealing length, m (> 0)
 * @param eccentricity_ratio assumed eccentricity ratio, 0..1
 * @param clearance_m receives the radial clearance (bore - piston)/2, m
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN (signs differ, or clearance would exceed 0.99 of the bore radius); PUMPLOSS_ENOCONVERGE; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::gap_annulus_clearance
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_annulus_clearance(double q_m3_s, double dp_pa, double mu_pa_s, double bore_diameter_m, double length_m, double eccentricity_ratio, double *clearance_m);
/**
 * Laminar radial flow between parallel discs: q = pi h^3 dp/(6 mu ln(ro/ri)).
 * @param dp_pa pressure at the inner radius minus pressure at the outer radius, Pa
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param inner_radius_m inner radius, m (> 0)
 * @param outer_radius_m outer radius, m (> inner)
 * @param height_m gap height, m (> 0)
 * @param q_m3_s receives the radial flow, m^3/s
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::gap_radial_flow
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_radial_flow(double dp_pa, double mu_pa_s, double inner_radius_m, double outer_radius_m, double height_m, double *q_m3_s);
/**
 * Radial flow through an arc sector (valve plate sealing land): q = phi h^3 dp/(12 mu ln(ro/ri)).
 * @param dp_pa inner minus outer pressure, Pa
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param inner_radius_m inner radius, m (> 0)
 * @param outer_radius_m outer radius, m (> inner)
 * @param height_m gap height, m (> 0)
 * @param angle_rad sector angle, rad (0 < angle <= 2 pi)
 * @param q_m3_s receives the flow, m^3/s
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::gap_radial_sector_flow
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_radial_sector_flow(double dp_pa, double mu_pa_s, double inner_radius_m, double outer_radius_m, double height_m, double angle_rad, double *q_m3_s);
/**
 * Gap height that explains a measured radial leakage: h = (6 mu q ln(ro/ri)/(pi dp))^(1/3).
 * @param q_m3_s measured radial leakage, m^3/s (same sign as dp_pa)
 * @param dp_pa pressure drop, Pa (nonzero)
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param inner_radius_m inner radius, m (> 0)
 * @param outer_radius_m outer radius, m (> inner)
 * @param height_m receives the gap height, m
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::gap_radial_height
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_radial_height(double q_m3_s, double dp_pa, double mu_pa_s, double inner_radius_m, double outer_radius_m, double *height_m);
/**
 * Pressure field of a radial land: p(r) = p_o + (p_i - p_o) ln(ro/r)/ln(ro/ri).
 * @param inner_pressure_pa pressure at the inner radius, Pa
 * @param outer_pressure_pa pressure at the outer radius, Pa
 * @param inner_radius_m inner radius, m (> 0)
 * @param outer_radius_m outer radius, m (> inner)
 * @param radius_m radius, m (inner..outer)
 * @param p_pa receives the pressure at radius_m, Pa
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN (radius outside the land); PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::gap_radial_pressure
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_radial_pressure(double inner_pressure_pa, double outer_pressure_pa, double inner_radius_m, double outer_radius_m, double radius_m, double *p_pa);
/**
 * Separating force of the pressure field on a radial land sector (integral of p(r) over the land).
 * @param inner_pressure_pa pressure at the inner radius, Pa
 * @param outer_pressure_pa pressure at the outer radius, Pa
 * @param inner_radius_m inner radius, m (> 0)
 * @param outer_radius_m outer radius, m (> inner)
 * @param angle_rad sector angle, rad (0 < angle <= 2 pi)
 * @param force_n receives the separating force of the pressure field on the land, N
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::gap_radial_land_force
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_radial_land_force(double inner_pressure_pa, double outer_pressure_pa, double inner_radius_m, double outer_radius_m, double angle_rad, double *force_n);
/**
 * Land gap at which a capillary-fed hydrostatic pad carries a given load.
 * @param supply_pressure_pa supply pressure, Pa (> 0)
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param capillary_diameter_m capillary bore, m (> 0)
 * @param capillary_length_m capillary length, m (> 0)
 * @param inner_radius_m recess radius, m (> 0)
 * @param outer_radius_m outer land radius, m (> inner)
 * @param load_n load to carry, N (0 < load < supply pressure times effective area)
 * @param height_m receives the land gap, m
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN (load cannot be carried); PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::gap_pad_capillary_height
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_pad_capillary_height(double supply_pressure_pa, double mu_pa_s, double capillary_diameter_m, double capillary_length_m, double inner_radius_m, double outer_radius_m, double load_n, double *height_m);
/**
 * Land gap at which an orifice-fed hydrostatic pad carries a given load.
 * @param supply_pressure_pa supply pressure, Pa (> 0)
 * @param rho_kg_m3 density, kg/m^3 (> 0)
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param orifice_diameter_m feed orifice diameter, m (> 0)
 * @param cd discharge coefficient of the feed orifice (0 < cd <= 1)
 * @param inner_radius_m recess radius, m (> 0)
 * @param outer_radius_m outer land radius, m (> inner)
 * @param load_n load to carry, N
 * @param height_m receives the land gap, m
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN (load cannot be carried); PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::gap_pad_orifice_height
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_pad_orifice_height(double supply_pressure_pa, double rho_kg_m3, double mu_pa_s, double orifice_diameter_m, double cd, double inner_radius_m, double outer_radius_m, double load_n, double *height_m);
/**
 * Gap Reynolds number on the hydraulic diameter 2h, with the laminar check.
 * @param q_m3_s flow through the gap, m^3/s
 * @param width_m wetted width across the flow, m (> 0; pi D_m for an annulus)
 * @param rho_kg_m3 density, kg/m^3 (> 0)
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param re receives Re = 2 rho q/(mu b)
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME (Re > 2000: laminar gap formulas do not apply); PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::gap_reynolds
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_reynolds(double q_m3_s, double width_m, double rho_kg_m3, double mu_pa_s, double *re);
/**
 * Sharp-edged orifice: q = cd (pi d^2/4) sqrt(2 dp/rho).
 * @param dp_pa pressure drop across the orifice, Pa (flow follows its sign)
 * @param rho_kg_m3 density, kg/m^3 (> 0)
 * @param diameter_m orifice diameter, m (> 0)
 * @param cd discharge coefficient (0 < cd <= 1; 0.611 for a sharp edge at high Re)
 * @param q_m3_s receives the flow, m^3/s
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::orifice_flow
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_orifice_flow(double dp_pa, double rho_kg_m3, double diameter_m, double cd, double *q_m3_s);
/**
 * Pressure drop of a sharp-edged orifice at a given flow (inverse of pumploss_orifice_flow()).
 * @param q_m3_s flow, m^3/s
 * @param rho_kg_m3 density, kg/m^3 (> 0)
 * @param diameter_m orifice diameter, m (> 0)
 * @param cd discharge coefficient (0 < cd <= 1)
 * @param dp_pa receives the pressure drop, Pa
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::orifice_dp
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_orifice_dp(double q_m3_s, double rho_kg_m3, double diameter_m, double cd, double *dp_pa);
/**
 * Orifice diameter that passes a given flow at a given pressure drop.
 * @param q_m3_s flow, m^3/s (same sign as dp_pa, nonzero)
 * @param dp_pa pressure drop, Pa (nonzero)
 * @param rho_kg_m3 density, kg/m^3 (> 0)
 * @param cd discharge coefficient (0 < cd <= 1)
 * @param diameter_m receives the orifice diameter, m
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::orifice_diameter
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_orifice_diameter(double q_m3_s, double dp_pa, double rho_kg_m3, double cd, double *diameter_m);
/**
 * Orifice Reynolds number, with the check for the constant-Cd (turbulent) assumption.
 * @param q_m3_s flow, m^3/s
 * @param diameter_m orifice diameter, m (> 0)
 * @param rho_kg_m3 density, kg/m^3 (> 0)
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param re receives Re = 4 rho q/(pi d mu)
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME (Re < 1000: use pumploss_orifice_flow_viscous()); PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::orifice_reynolds
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_orifice_reynolds(double q_m3_s, double diameter_m, double rho_kg_m3, double mu_pa_s, double *re);
/**
 * Orifice flow at any Reynolds number with the blended coefficient 1/Cd^2 = 1/cd_inf^2 + 1/(delta^2 Re), solved exactly.
 * @param dp_pa pressure drop, Pa
 * @param rho_kg_m3 density, kg/m^3 (> 0)
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param diameter_m orifice diameter, m (> 0)
 * @param cd_inf turbulent discharge coefficient (0 < cd_inf <= 1)
 * @param delta laminar coefficient of Cd = delta sqrt(Re) (> 0; 0.16287 = 1/sqrt(12 pi) after Sampson)
 * @param q_m3_s receives the flow, m^3/s
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::orifice_flow_viscous
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_orifice_flow_viscous(double dp_pa, double rho_kg_m3, double mu_pa_s, double diameter_m, double cd_inf, double delta, double *q_m3_s);
/**
 * Capillary tube flow: root of 128 mu L q/(pi d^4) + K rho v^2/2 = dp, solved in cancellation-free form.
 * @param dp_pa pressure drop, Pa
 * @param rho_kg_m3 density, kg/m^3 (> 0)
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param diameter_m tube bore, m (> 0)
 * @param length_m tube length, m (> 0)
 * @param loss_coefficient entrance plus exit loss coefficient K (>= 0)
 * @param q_m3_s receives the flow, m^3/s
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME (tube Re > 2000); PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::capillary_flow
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_capillary_flow(double dp_pa, double rho_kg_m3, double mu_pa_s, double diameter_m, double length_m, double loss_coefficient, double *q_m3_s);
/**
 * Capillary tube pressure drop: dp = 128 mu L q/(pi d^4) + K rho v^2/2.
 * @param q_m3_s flow, m^3/s
 * @param rho_kg_m3 density, kg/m^3 (> 0)
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param diameter_m tube bore, m (> 0)
 * @param length_m tube length, m (> 0)
 * @param loss_coefficient entrance plus exit loss coefficient K (>= 0)
 * @param dp_pa receives the pressure drop, Pa
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME (tube Re > 2000); PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::capillary_dp
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_capillary_dp(double q_m3_s, double rho_kg_m3, double mu_pa_s, double diameter_m, double length_m, double loss_coefficient, double *dp_pa);
/**
 * Equivalent Cd A of two square-law restrictions in series: 1/cda^2 = 1/cda1^2 + 1/cda2^2 (chain for more).
 * @param cda1_m2 Cd A of the first restriction, m^2 (> 0)
 * @param cda2_m2 Cd A of the second restriction, m^2 (> 0)
 * @param cda_m2 receives the equivalent Cd A, m^2
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::orifice_series_cda
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_orifice_series_cda(double cda1_m2, double cda2_m2, double *cda_m2);
/**
 * Equivalent Cd A of two square-law restrictions in parallel: cda1 + cda2.
 * @param cda1_m2 Cd A of the first restriction, m^2 (>= 0)
 * @param cda2_m2 Cd A of the second restriction, m^2 (>= 0)
 * @param cda_m2 receives the equivalent Cd A, m^2
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::orifice_parallel_cda
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_orifice_parallel_cda(double cda1_m2, double cda2_m2, double *cda_m2);
/**
 * Flow through a square-law restriction of effective area Cd A: q = cda sqrt(2 dp/rho).
 * @param dp_pa pressure drop, Pa
 * @param rho_kg_m3 density, kg/m^3 (> 0)
 * @param cda_m2 effective area Cd A, m^2 (>= 0)
 * @param q_m3_s receives the flow, m^3/s
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::orifice_flow_cda
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_orifice_flow_cda(double dp_pa, double rho_kg_m3, double cda_m2, double *q_m3_s);
/**
 * Hydrostatic pad (slipper) fed through a capillary: pocket pressure, leakage, force, balance ratio.
 * @param supply_pressure_pa supply pressure, Pa (> 0)
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param capillary_diameter_m capillary bore, m (> 0)
 * @param capillary_length_m capillary length, m (> 0)
 * @param inner_radius_m recess radius, m (> 0)
 * @param outer_radius_m outer land radius, m (> inner)
 * @param height_m land gap, m (> 0)
 * @param piston_diameter_m piston diameter for the balance ratio, m (> 0)
 * @param pocket_pressure_pa receives the recess pressure, Pa
 * @param q_m3_s receives the leakage, m^3/s
 * @param force_n receives the hydrostatic force, N
 * @param balance_ratio receives pad force / (supply pressure x piston area)
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE (NULL output).
 * @sa pumploss::gap_pad_capillary
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_pad_capillary(double supply_pressure_pa, double mu_pa_s, double capillary_diameter_m, double capillary_length_m, double inner_radius_m, double outer_radius_m, double height_m, double piston_diameter_m, double *pocket_pressure_pa, double *q_m3_s, double *force_n, double *balance_ratio);
/**
 * Hydrostatic pad (slipper) fed through a sharp-edged orifice: pocket pressure, leakage, force, balance ratio.
 * @param supply_pressure_pa supply pressure, Pa (> 0)
 * @param rho_kg_m3 density, kg/m^3 (> 0)
 * @param mu_pa_s dynamic viscosity, Pa s (> 0)
 * @param orifice_diameter_m feed orifice diameter, m (> 0)
 * @param cd discharge coefficient of the feed orifice (0 < cd <= 1)
 * @param inner_radius_m recess radius, m (> 0)
 * @param outer_radius_m outer land radius, m (> inner)
 * @param height_m land gap, m (> 0)
 * @param piston_diameter_m piston diameter for the balance ratio, m (> 0)
 * @param pocket_pressure_pa receives the recess pressure, Pa
 * @param q_m3_s receives the leakage, m^3/s
 * @param force_n receives the hydrostatic force, N
 * @param balance_ratio receives pad force / (supply pressure x piston area)
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE (NULL output).
 * @sa pumploss::gap_pad_orifice
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_pad_orifice(double supply_pressure_pa, double rho_kg_m3, double mu_pa_s, double orifice_diameter_m, double cd, double inner_radius_m, double outer_radius_m, double height_m, double piston_diameter_m, double *pocket_pressure_pa, double *q_m3_s, double *force_n, double *balance_ratio);
/**
 * Batch form of pumploss_gap_plates_flow(): element i uses the i-th entry of every input array.
 * @param n number of elements
 * @param dp_pa array of n values: pressure drop along the gap, Pa
 * @param mu_pa_s array of n values: dynamic viscosity, Pa s (> 0)
 * @param width_m array of n values: gap width across the flow, m (> 0)
 * @param height_m array of n values: gap height, m (> 0)
 * @param length_m array of n values: gap length in the flow direction, m (> 0)
 * @param wall_speed_m_s array of n values: speed of the moving wall along the flow, m/s
 * @param q_m3_s array of n outputs (the leakage flow, m^3/s)
 * @param status array of n per-element status codes
 * @return PUMPLOSS_OK; the first report code seen; PUMPLOSS_EPARTIAL when an element failed (see status);
 *         PUMPLOSS_EMISUSE for a NULL array (outputs NaN).
 * @sa pumploss_gap_plates_flow
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_plates_flow_batch(size_t n, const double *dp_pa, const double *mu_pa_s, const double *width_m, const double *height_m, const double *length_m, const double *wall_speed_m_s, double *q_m3_s, int *status);
/**
 * Batch form of pumploss_gap_annulus_flow(): element i uses the i-th entry of every input array.
 * @param n number of elements
 * @param dp_pa array of n values: pressure drop along the piston, Pa
 * @param mu_pa_s array of n values: dynamic viscosity, Pa s (> 0)
 * @param bore_diameter_m array of n values: bore diameter, m (> piston diameter)
 * @param piston_diameter_m array of n values: piston diameter, m (> 0)
 * @param length_m array of n values: sealing length, m (> 0)
 * @param eccentricity_ratio array of n values: centre offset / radial clearance, 0 (concentric) to 1 (touching)
 * @param q_m3_s array of n outputs (the leakage flow, m^3/s)
 * @param status array of n per-element status codes
 * @return PUMPLOSS_OK; the first report code seen; PUMPLOSS_EPARTIAL when an element failed (see status);
 *         PUMPLOSS_EMISUSE for a NULL array (outputs NaN).
 * @sa pumploss_gap_annulus_flow
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_annulus_flow_batch(size_t n, const double *dp_pa, const double *mu_pa_s, const double *bore_diameter_m, const double *piston_diameter_m, const double *length_m, const double *eccentricity_ratio, double *q_m3_s, int *status);
/**
 * Batch form of pumploss_gap_radial_flow(): element i uses the i-th entry of every input array.
 * @param n number of elements
 * @param dp_pa array of n values: pressure at the inner radius minus pressure at the outer radius, Pa
 * @param mu_pa_s array of n values: dynamic viscosity, Pa s (> 0)
 * @param inner_radius_m array of n values: inner radius, m (> 0)
 * @param outer_radius_m array of n values: outer radius, m (> inner)
 * @param height_m array of n values: gap height, m (> 0)
 * @param q_m3_s array of n outputs (the radial flow, m^3/s)
 * @param status array of n per-element status codes
 * @return PUMPLOSS_OK; the first report code seen; PUMPLOSS_EPARTIAL when an element failed (see status);
 *         PUMPLOSS_EMISUSE for a NULL array (outputs NaN).
 * @sa pumploss_gap_radial_flow
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_radial_flow_batch(size_t n, const double *dp_pa, const double *mu_pa_s, const double *inner_radius_m, const double *outer_radius_m, const double *height_m, double *q_m3_s, int *status);
/**
 * Batch form of pumploss_orifice_flow(): element i uses the i-th entry of every input array.
 * @param n number of elements
 * @param dp_pa array of n values: pressure drop across the orifice, Pa (flow follows its sign)
 * @param rho_kg_m3 array of n values: density, kg/m^3 (> 0)
 * @param diameter_m array of n values: orifice diameter, m (> 0)
 * @param cd array of n values: discharge coefficient (0 < cd <= 1; 0.611 for a sharp edge at high Re)
 * @param q_m3_s array of n outputs (the flow, m^3/s)
 * @param status array of n per-element status codes
 * @return PUMPLOSS_OK; the first report code seen; PUMPLOSS_EPARTIAL when an element failed (see status);
 *         PUMPLOSS_EMISUSE for a NULL array (outputs NaN).
 * @sa pumploss_orifice_flow
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_orifice_flow_batch(size_t n, const double *dp_pa, const double *rho_kg_m3, const double *diameter_m, const double *cd, double *q_m3_s, int *status);
/** @} */

/* ==== friction ==== */
/** @name Friction factor and pipe pressure drop
 *  Darcy friction factors and the Darcy-Weisbach pressure drop of a straight pipe, tube or
 *  hose (see @ref theory_friction). @{ */
/**
 * Darcy friction factor for any Reynolds number: 64/Re up to Re = 2000, Colebrook-White
 * (solved to within 4 ulp, fixed work) from Re = 4000, and a straight line in Re between the
 * two in the transition region (reported as PUMPLOSS_WTRANSITION).
 * @param reynolds Reynolds number, > 0
 * @param relative_roughness epsilon/D, 0 to 1
 * @param f_darcy receives the Darcy friction factor
 * @return PUMPLOSS_OK; PUMPLOSS_WTRANSITION (2000 < Re < 4000); PUMPLOSS_WREGIME (Re > 1e8 or
 *         epsilon/D > 0.05); PUMPLOSS_EDOMAIN (Re <= 0, epsilon/D < 0 or > 1);
 *         PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE for NULL.
 * @sa pumploss::friction_factor
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_friction_factor(double reynolds, double relative_roughness,
                                                        double *f_darcy);
/**
 * As pumploss_friction_factor() with another constant C of the laminar law f = C/Re.
 * @param reynolds Reynolds number, > 0
 * @param relative_roughness epsilon/D, 0 to 1
 * @param laminar_constant C, > 0 (64 for a round pipe; 75 is used by some for cold oil in
 *        hoses, common practice, no source)
 * @param f_darcy receives the Darcy friction factor
 * @return as pumploss_friction_factor(); PUMPLOSS_EDOMAIN for C <= 0.
 * @sa pumploss::friction_factor
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_friction_factor_custom_laminar(double reynolds, double relative_roughness,
                                                                       double laminar_constant, double *f_darcy);
/**
 * Laminar friction factor f = C/Re.
 * @param reynolds Reynolds number, > 0
 * @param laminar_constant C, > 0 (64 for a round pipe)
 * @param f_darcy receives f
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME above Re = 2000; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE.
 * @sa pumploss::friction_laminar
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_friction_laminar(double reynolds, double laminar_constant, double *f_darcy);
/**
 * Colebrook-White friction factor (Clamond's method plus one Newton step in double-double).
 * @param reynolds Reynolds number, >= 1000 (4e3 to 1e8 tested)
 * @param relative_roughness epsilon/D, 0 to 1
 * @param f_darcy receives f
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME outside 4e3 <= Re <= 1e8, epsilon/D <= 0.05;
 *         PUMPLOSS_EVALIDITY below Re = 1000; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE.
 * @sa pumploss::friction_colebrook
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_friction_colebrook(double reynolds, double relative_roughness,
                                                           double *f_darcy);
/**
 * Haaland's explicit friction factor (within about 1.5 % of Colebrook).
 * @param reynolds Reynolds number, > 0
 * @param relative_roughness epsilon/D, 0 to 1
 * @param f_darcy receives f
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME outside 4e3 <= Re <= 1e8, epsilon/D <= 0.05; errors
 *         as pumploss_friction_colebrook().
 * @sa pumploss::friction_haaland
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_friction_haaland(double reynolds, double relative_roughness,
                                                         double *f_darcy);
/**
 * Swamee-Jain explicit friction factor.
 * @param reynolds Reynolds number, > 0
 * @param relative_roughness epsilon/D, 0 to 1
 * @param f_darcy receives f
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME outside 5e3 <= Re <= 1e8, 1e-6 <= epsilon/D <= 1e-2;
 *         errors as pumploss_friction_colebrook().
 * @sa pumploss::friction_swamee_jain
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_friction_swamee_jain(double reynolds, double relative_roughness,
                                                             double *f_darcy);
/**
 * Churchill (1977) friction factor for all regimes.
 * @param reynolds Reynolds number, > 0
 * @param relative_roughness epsilon/D, 0 to 1
 * @param f_darcy receives f
 * @return PUMPLOSS_OK; PUMPLOSS_WTRANSITION for 2000 < Re < 4000; PUMPLOSS_WREGIME above
 *         epsilon/D = 0.05; errors as pumploss_friction_colebrook().
 * @sa pumploss::friction_churchill
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_friction_churchill(double reynolds, double relative_roughness,
                                                           double *f_darcy);
/**
 * Mean velocity in a round bore, v = 4q/(pi D^2).
 * @param q_m3_s volume flow, m^3/s (any sign)
 * @param diameter_m inside diameter, m, > 0
 * @param v_m_s receives the velocity, m/s
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::pipe_velocity
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_pipe_velocity(double q_m3_s, double diameter_m, double *v_m_s);
/**
 * Reynolds number in a round bore, Re = 4 rho |q| / (pi mu D).
 * @param q_m3_s volume flow, m^3/s
 * @param rho_kg_m3 density, kg/m^3, > 0
 * @param mu_pa_s dynamic viscosity, Pa s, > 0
 * @param diameter_m inside diameter, m, > 0
 * @param reynolds receives Re
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::pipe_reynolds
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_pipe_reynolds(double q_m3_s, double rho_kg_m3, double mu_pa_s,
                                                      double diameter_m, double *reynolds);
/**
 * Darcy-Weisbach pressure drop of a straight pipe, tube or hose, with
 * pumploss_friction_factor() (laminar constant 64).
 * @param q_m3_s volume flow, m^3/s (any sign; the drop has its sign)
 * @param rho_kg_m3 density, kg/m^3, > 0
 * @param mu_pa_s dynamic viscosity, Pa s, > 0
 * @param diameter_m inside diameter, m, > 0
 * @param length_m length, m, >= 0
 * @param roughness_m absolute roughness, m, 0 to diameter_m
 * @param dp_pa receives the pressure drop, Pa
 * @return PUMPLOSS_OK; PUMPLOSS_WTRANSITION; PUMPLOSS_WREGIME; PUMPLOSS_EDOMAIN (zero or
 *         negative diameter, negative length, roughness larger than the diameter, ...);
 *         PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::pipe_pressure_drop
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_pipe_pressure_drop(double q_m3_s, double rho_kg_m3, double mu_pa_s,
                                                           double diameter_m, double length_m, double roughness_m,
                                                           double *dp_pa);
/**
 * Darcy-Weisbach segment with all intermediate values and a chosen laminar constant.
 * @param q_m3_s volume flow, m^3/s
 * @param rho_kg_m3 density, kg/m^3, > 0
 * @param mu_pa_s dynamic viscosity, Pa s, > 0
 * @param diameter_m inside diameter, m, > 0
 * @param length_m length, m, >= 0
 * @param roughness_m absolute roughness, m, 0 to diameter_m
 * @param laminar_constant C of the laminar law f = C/Re, > 0 (64 for a round pipe)
 * @param v_m_s receives the mean velocity, m/s
 * @param reynolds receives the Reynolds number
 * @param f_darcy receives the friction factor; NaN at zero flow, where it is undefined (it
 *        grows without bound as C/Re)
 * @param dp_pa receives the pressure drop, Pa
 * @return as pumploss_pipe_pressure_drop(); PUMPLOSS_WUNDEFINED at q_m3_s = 0 (v_m_s, reynolds
 *         and dp_pa are 0, f_darcy is NaN).
 * @sa pumploss::pipe_pressure_drop
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_pipe_flow(double q_m3_s, double rho_kg_m3, double mu_pa_s, double diameter_m,
                                                  double length_m, double roughness_m, double laminar_constant,
                                                  double *v_m_s, double *reynolds, double *f_darcy, double *dp_pa);
/**
 * pumploss_friction_factor() over arrays. No allocation.
 * @param n number of elements
 * @param reynolds n Reynolds numbers
 * @param relative_roughness n relative roughnesses
 * @param f_darcy receives n friction factors (NaN where an element failed)
 * @param status receives n per-element status codes
 * @return PUMPLOSS_OK; the first report code seen; PUMPLOSS_EPARTIAL when any element failed;
 *         PUMPLOSS_EMISUSE for a NULL array (all outputs NaN / EMISUSE).
 * @sa pumploss::friction_factor
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_friction_factor_batch(size_t n, const double *reynolds,
                                                              const double *relative_roughness, double *f_darcy,
                                                              int *status);
/**
 * pumploss_pipe_pressure_drop() over arrays. No allocation.
 * @param n number of elements
 * @param q_m3_s n flows, m^3/s
 * @param rho_kg_m3 n densities, kg/m^3
 * @param mu_pa_s n dynamic viscosities, Pa s
 * @param diameter_m n inside diameters, m
 * @param length_m n lengths, m
 * @param roughness_m n roughnesses, m
 * @param dp_pa receives n pressure drops, Pa
 * @param status receives n per-element status codes
 * @return as pumploss_friction_factor_batch().
 * @sa pumploss::pipe_pressure_drop
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_pipe_pressure_drop_batch(size_t n, const double *q_m3_s,
                                                                 const double *rho_kg_m3, const double *mu_pa_s,
                                                                 const double *diameter_m, const double *length_m,
                                                                 const double *roughness_m, double *dp_pa,
                                                                 int *status);
/** @} */
/** @name Lines, case drain check and sizing
 *  A line is an opaque handle: an ordered list of pipes, fittings and lumped components, a
 *  static height and an oil. Functions taking a handle return PUMPLOSS_EMISUSE for NULL. The
 *  handle contract of this header's top comment holds: add_ and set_ functions change the
 *  handle (and its message, pumploss_line_last_message()); evaluations take a const handle and
 *  never write it, so one configured line may be evaluated from many threads at once. Results
 *  are engineering estimates; the pump maker's allowed case pressure governs. @{ */
/** Opaque line handle. */
typedef struct pumploss_line pumploss_line;
#define PUMPLOSS_BORE_TUBE 1 /**< Standard bore kind: metric hydraulic tube (a kinds_mask bit). */
#define PUMPLOSS_BORE_HOSE 2 /**< Standard bore kind: hose, SAE dash size (a kinds_mask bit). */
/** Create an empty line (no elements, height 0, no oil).
 *  @param out receives the handle (NULL on error); free it with pumploss_line_destroy()
 *  @return PUMPLOSS_OK, PUMPLOSS_EMISUSE (out is NULL), PUMPLOSS_ENOMEM. */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_create(pumploss_line **out);
/** Destroy a line. Destroying NULL is a no-op.
 *  @param line the handle (or NULL) */
PUMPLOSS_API void PUMPLOSS_CALL pumploss_line_destroy(pumploss_line *line);
/** The message of the last add_ or set_ call on the handle (why it failed, or "no error").
 *  Evaluations never change it: their status says why they failed (pumploss_status_message()).
 *  @param line the handle
 *  @return a sentence owned by the handle, valid until its next add_ / set_ call or its
 *          destruction; a static sentence for NULL. */
PUMPLOSS_API const char *PUMPLOSS_CALL pumploss_line_last_message(const pumploss_line *line);
/** Append a straight pipe, tube or hose (Darcy-Weisbach).
 *  @param line the handle
 *  @param diameter_m inside diameter, m, > 0
 *  @param length_m length, m, >= 0
 *  @param roughness_m absolute roughness, m, 0 to diameter_m
 *  @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN, PUMPLOSS_ENONFINITE (element not added).
 *  @sa pumploss::line_pipe */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_add_pipe(pumploss_line *line, double diameter_m, double length_m,
                                                      double roughness_m);
/** Append a fitting with a constant loss coefficient (sharp entrance 0.57, exit 1.0). A constant K
 *  is a turbulent value: evaluations below Re = 1e4 return PUMPLOSS_WREGIME; prefer
 *  pumploss_line_add_fitting_named() and pumploss_line_add_exit().
 *  @param line the handle
 *  @param diameter_m bore the K refers to, m, > 0; 0 for a fitting: the bore of the element it
 *         follows (at the start of the line, of the first element after it)
 *  @param k loss coefficient, >= 0
 *  @return PUMPLOSS_OK or an error (element not added). @sa pumploss::line_fitting_k */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_add_fitting_k(pumploss_line *line, double diameter_m, double k);
/** Append a fitting by the equivalent-length method, K = f_T (L/D)_eq (f_T of
 *  pumploss_friction_factor_ft(); (L/D)_eq of Crane Technical Paper 410, 2009; reported
 *  PUMPLOSS_WREGIME below Re = 4000).
 *  @param line the handle
 *  @param diameter_m bore, m, > 0 (0: the bore of the element it follows)
 *  @param l_over_d equivalent length in diameters, >= 0 (gate valve 8, ball valve 3, globe 340)
 *  @return PUMPLOSS_OK or an error. @sa pumploss::line_fitting_l_over_d */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_add_fitting_l_over_d(pumploss_line *line, double diameter_m,
                                                                  double l_over_d);
/** Append a fitting by Hooper's 2-K method.
 *  @param line the handle
 *  @param diameter_m bore, m, > 0 (0: the bore of the element it follows)
 *  @param k1 K_1, >= 0
 *  @param k_inf K_infinity, >= 0
 *  @return PUMPLOSS_OK or an error. @sa pumploss::k_hooper */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_add_fitting_hooper(pumploss_line *line, double diameter_m, double k1,
                                                                double k_inf);
/** Append a fitting by Darby's 3-K method (nominal size = inside diameter in inches).
 *  @param line the handle
 *  @param diameter_m bore, m, > 0 (0: the bore of the element it follows)
 *  @param k1 K_1, >= 0
 *  @param k_i K_i, >= 0
 *  @param k_d K_d, >= 0
 *  @return PUMPLOSS_OK or an error. @sa pumploss::k_darby */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_add_fitting_darby(pumploss_line *line, double diameter_m, double k1,
                                                               double k_i, double k_d);
/** Append a lumped component dp = dp_ref (q/q_ref)^n (nu/nu_ref)^m (filter, cooler, check valve).
 *  @param line the handle
 *  @param q_ref_m3_s reference flow, m^3/s, > 0
 *  @param dp_ref_pa drop at q_ref and nu_ref, Pa, >= 0
 *  @param exponent n, > 0
 *  @param nu_ref_m2_s viscosity of the data, m^2/s, > 0
 *  @param nu_exponent m, >= 0 (1 for laminar elements such as filter media, 0 none)
 *  @return PUMPLOSS_OK or an error. @sa pumploss::line_component_power */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_add_component_power(pumploss_line *line, double q_ref_m3_s,
                                                                 double dp_ref_pa, double exponent,
                                                                 double nu_ref_m2_s, double nu_exponent);
/** Append a lumped component given by points, interpolated linearly (through 0 below the
 *  first; extrapolated above the last with PUMPLOSS_WEXTRAPOLATED), times (nu/nu_ref)^m.
 *  @param line the handle
 *  @param n number of points, 1 to 16
 *  @param q_m3_s n flows, increasing, > 0
 *  @param dp_pa n drops, non-decreasing, >= 0
 *  @param nu_ref_m2_s viscosity of the data, m^2/s, > 0
 *  @param nu_exponent m, >= 0
 *  @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN for a bad count or data; PUMPLOSS_EMISUSE for NULL.
 *  @sa pumploss::line_component_points */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_add_component_points(pumploss_line *line, size_t n, const double *q_m3_s,
                                                                  const double *dp_pa, double nu_ref_m2_s,
                                                                  double nu_exponent);
/** Set the height of the line's outlet above its inlet (static part rho g dz).
 *  @param line the handle
 *  @param height_m height, m (negative when the outlet is below the inlet)
 *  @return PUMPLOSS_OK; PUMPLOSS_ENONFINITE. */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_set_height(pumploss_line *line, double height_m);
/** Set the line's oil: ASTM D341 line through two points and the density at a reference
 *  temperature; the other properties are pumploss_typical_mineral_oil()'s.
 *  @param line the handle
 *  @param t1_k first temperature, K
 *  @param nu1_m2_s kinematic viscosity at t1_k, m^2/s
 *  @param t2_k second temperature, K
 *  @param nu2_m2_s kinematic viscosity at t2_k, m^2/s
 *  @param rho_ref_kg_m3 density at t_ref_k, kg/m^3, > 0
 *  @param t_ref_k reference temperature of the density, K, > 0
 *  @return PUMPLOSS_OK or the error of pumploss_d341_coefficients(). */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_set_oil(pumploss_line *line, double t1_k, double nu1_m2_s, double t2_k,
                                                     double nu2_m2_s, double rho_ref_kg_m3, double t_ref_k);
/** Number of elements.
 *  @param line the handle
 *  @param count receives the count
 *  @return PUMPLOSS_OK; PUMPLOSS_EMISUSE. */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_element_count(const pumploss_line *line, size_t *count);
/** The line's height.
 *  @param line the handle
 *  @param height_m receives the height, m
 *  @return PUMPLOSS_OK; PUMPLOSS_EMISUSE. */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_height(const pumploss_line *line, double *height_m);
/** Total pressure drop at a flow, density and viscosity (static part included).
 *  @param line the handle
 *  @param q_m3_s flow, m^3/s
 *  @param rho_kg_m3 density, kg/m^3, > 0
 *  @param mu_pa_s dynamic viscosity, Pa s, > 0
 *  @param dp_pa receives the drop, Pa
 *  @return PUMPLOSS_OK, a report (worst element) or an error. @sa pumploss::line_pressure_drop */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_pressure_drop(const pumploss_line *line, double q_m3_s, double rho_kg_m3,
                                                           double mu_pa_s, double *dp_pa);
/** One element's drop and its share of the total.
 *  @param line the handle
 *  @param index element index, 0 to count-1
 *  @param q_m3_s flow, m^3/s
 *  @param rho_kg_m3 density, kg/m^3
 *  @param mu_pa_s dynamic viscosity, Pa s
 *  @param dp_pa receives the element's drop, Pa
 *  @param share receives the element's drop divided by the line's total (static part included)
 *  @return as pumploss_line_pressure_drop(); PUMPLOSS_EDOMAIN for a bad index. */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_element_pressure_drop(const pumploss_line *line, int index, double q_m3_s,
                                                                   double rho_kg_m3, double mu_pa_s, double *dp_pa,
                                                                   double *share);
/** Total pressure drop at a flow and oil temperature (the oil set by pumploss_line_set_oil()).
 *  @param line the handle
 *  @param q_m3_s flow, m^3/s
 *  @param t_k oil temperature, K
 *  @param dp_pa receives the drop, Pa
 *  @return as pumploss_line_pressure_drop(); PUMPLOSS_EMISUSE when no oil is set.
 *  @sa pumploss::line_pressure_drop_at */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_pressure_drop_at(const pumploss_line *line, double q_m3_s, double t_k,
                                                              double *dp_pa);
/** The flow a pressure difference drives through the line (bracket and solve, fixed caps).
 *  @param line the handle
 *  @param dp_pa pressure difference, Pa
 *  @param rho_kg_m3 density, kg/m^3
 *  @param mu_pa_s dynamic viscosity, Pa s
 *  @param q_m3_s receives the flow, m^3/s
 *  @return PUMPLOSS_OK; PUMPLOSS_EVALIDITY when dp does not exceed the static part;
 *          PUMPLOSS_ENOCONVERGE; element errors. @sa pumploss::line_flow_for_pressure */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_flow_for_pressure(const pumploss_line *line, double dp_pa, double rho_kg_m3,
                                                               double mu_pa_s, double *q_m3_s);
/** Case drain check: case pressure p_tank + line drop at n temperatures from cold start to
 *  maximum, against the allowed case pressure.
 *  @param line the drain line (oil set)
 *  @param q_drain_m3_s drain flow, m^3/s, >= 0
 *  @param t_cold_k cold-start temperature, K
 *  @param t_max_k maximum temperature, K, >= t_cold_k
 *  @param n_temps number of temperatures, 1 to 1000 (the length of the four output arrays)
 *  @param p_tank_pa tank pressure at the outlet, Pa
 *  @param p_allowed_pa allowed case pressure, Pa (same reference)
 *  @param t_k receives n_temps temperatures, K
 *  @param case_pressure_pa receives n_temps case pressures, Pa
 *  @param margin_pa receives n_temps margins (allowed minus case pressure), Pa
 *  @param pass receives n_temps flags (1 pass, 0 fail)
 *  @param worst_margin_pa receives the smallest margin, Pa (negative: fails)
 *  @return PUMPLOSS_OK or a report; errors with NaN outputs. @sa pumploss::drain_check */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_drain_check(const pumploss_line *line, double q_drain_m3_s, double t_cold_k,
                                                         double t_max_k, size_t n_temps, double p_tank_pa,
                                                         double p_allowed_pa, double t_k[], double case_pressure_pa[],
                                                         double margin_pa[], int pass[], double *worst_margin_pa);
/** Smallest standard bore (pumploss_standard_bore()) for which the line, with every pipe and
 *  fitting at that bore, passes the drain check over the temperature range and keeps the
 *  velocity at or below v_max.
 *  @param line the drain line (oil set)
 *  @param q_drain_m3_s drain flow, m^3/s, > 0
 *  @param t_cold_k cold-start temperature, K
 *  @param t_max_k maximum temperature, K
 *  @param n_temps number of temperatures, 2 to 1000
 *  @param p_tank_pa tank pressure, Pa
 *  @param p_allowed_pa allowed case pressure, Pa
 *  @param v_max_m_s largest velocity, m/s (1.5 for drain lines, common practice, no source)
 *  @param kinds_mask PUMPLOSS_BORE_TUBE, PUMPLOSS_BORE_HOSE or both (bitwise or)
 *  @param diameter_m receives the inside diameter, m
 *  @param velocity_m_s receives the velocity at the drain flow, m/s
 *  @param worst_margin_pa receives the smallest margin, Pa
 *  @return PUMPLOSS_OK or a report; PUMPLOSS_EVALIDITY when no standard bore passes.
 *  @sa pumploss::size_drain_line */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_size_drain(const pumploss_line *line, double q_drain_m3_s, double t_cold_k,
                                                        double t_max_k, size_t n_temps, double p_tank_pa,
                                                        double p_allowed_pa, double v_max_m_s, int kinds_mask,
                                                        double *diameter_m, double *velocity_m_s,
                                                        double *worst_margin_pa);
/** Number of standard bores.
 *  @param count receives the count
 *  @return PUMPLOSS_OK; PUMPLOSS_EMISUSE for NULL. */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_standard_bore_count(size_t *count);
/** A standard bore (ascending inside diameter).
 *  @param index 0 to the count of pumploss_standard_bore_count() - 1
 *  @param inside_diameter_m receives the inside diameter, m
 *  @param kind receives PUMPLOSS_BORE_TUBE (metric tube) or PUMPLOSS_BORE_HOSE (hose, dash
 *         size = ID in sixteenths of an inch)
 *  @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN for a bad index; PUMPLOSS_EMISUSE for NULL. */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_standard_bore(size_t index, double *inside_diameter_m, int *kind);
/** Fully turbulent friction factor f_T of clean commercial steel, used by the equivalent-length
 *  fitting method K = f_T (L/D)_eq (f_T table of Crane Technical Paper 410, 2009).
 *  @param diameter_m inside diameter, m, > 0
 *  @param f_t receives f_T
 *  @return PUMPLOSS_OK; PUMPLOSS_WREGIME outside 5 mm to 1 m; errors.
 *  @sa pumploss::friction_factor_ft */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_friction_factor_ft(double diameter_m, double *f_t);
/** Hooper 2-K loss coefficient.
 *  @param k1 K_1
 *  @param k_inf K_infinity
 *  @param diameter_m bore, m
 *  @param reynolds Reynolds number
 *  @param k receives K
 *  @return PUMPLOSS_OK or an error. @sa pumploss::k_hooper */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_k_hooper(double k1, double k_inf, double diameter_m, double reynolds,
                                                 double *k);
/** Darby 3-K loss coefficient.
 *  @param k1 K_1
 *  @param k_i K_i
 *  @param k_d K_d
 *  @param nominal_size_in nominal size, inches
 *  @param reynolds Reynolds number
 *  @param k receives K
 *  @return PUMPLOSS_OK or an error. @sa pumploss::k_darby */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_k_darby(double k1, double k_i, double k_d, double nominal_size_in,
                                                double reynolds, double *k);
/** Equivalent length of a loss coefficient, L = K D / f.
 *  @param k loss coefficient
 *  @param diameter_m bore, m
 *  @param f_darcy Darcy friction factor
 *  @param length_m receives the length, m
 *  @return PUMPLOSS_OK or an error. @sa pumploss::equivalent_length */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_equivalent_length(double k, double diameter_m, double f_darcy,
                                                          double *length_m);
/** @} */
/* ---- drain line: named fittings, laminar exit, drain flow over temperature, peak, start ---- */
/** @name Named fittings, drain flow over temperature, destroke peak, start temperature
 *  Functions of this block that read a line handle take it const, never write it and keep no
 *  message in it: a verdict text goes to the caller's buffer. @{ */
#define PUMPLOSS_FITTING_ELBOW_90_THREADED 0     /**< 90 degree elbow, threaded, r/D = 1 */
#define PUMPLOSS_FITTING_ELBOW_90_FLANGED 1      /**< 90 degree elbow, flanged/welded or bend, r/D = 1 */
#define PUMPLOSS_FITTING_ELBOW_90_LONG_RADIUS 2  /**< 90 degree elbow, long radius, r/D = 1.5 */
#define PUMPLOSS_FITTING_BEND_90_R2 3            /**< 90 degree tube bend, r/D = 2 (Darby only) */
#define PUMPLOSS_FITTING_BEND_90_R4 4            /**< 90 degree tube bend, r/D = 4 (Darby only) */
#define PUMPLOSS_FITTING_ELBOW_45_THREADED 5     /**< 45 degree elbow, threaded, r/D = 1 */
#define PUMPLOSS_FITTING_ELBOW_45_LONG_RADIUS 6  /**< 45 degree elbow, long radius, r/D = 1.5 */
#define PUMPLOSS_FITTING_BEND_180_R15 7          /**< 180 degree return bend, r/D = 1.5 */
#define PUMPLOSS_FITTING_TEE_RUN_THREADED 8      /**< tee, flow through the run, threaded */
#define PUMPLOSS_FITTING_TEE_BRANCH_THREADED 9   /**< tee, flow through the branch, threaded */
#define PUMPLOSS_FITTING_BALL_VALVE_FULL_BORE 10 /**< ball valve, full bore (Darby only) */
#define PUMPLOSS_FITTING_SWING_CHECK 11          /**< swing check valve */
#define PUMPLOSS_FITTING_LIFT_CHECK 12           /**< lift check valve */
#define PUMPLOSS_FITTING_METHOD_DARBY_3K 0       /**< Darby's 3-K method (the default) */
#define PUMPLOSS_FITTING_METHOD_HOOPER_2K 1      /**< Hooper's 2-K method */
/** Loss coefficient of a named fitting kind at a Reynolds number (Darby 2001 or Hooper 1981
 *  constants).
 *  @param type PUMPLOSS_FITTING_*
 *  @param method PUMPLOSS_FITTING_METHOD_*
 *  @param diameter_m bore, m, > 0
 *  @param reynolds Reynolds number, > 0
 *  @param k receives K
 *  @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN for an unknown kind or a method not tabulated for it.
 *  @sa pumploss::k_fitting */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_k_fitting(int type, int method, double diameter_m, double reynolds,
                                                  double *k);
/** Exit loss coefficient with the kinetic energy factor: 2 in laminar flow (Re <= 2000), 1 in
 *  turbulent flow (Re >= 4000), linear between (PUMPLOSS_WTRANSITION).
 *  @param reynolds Reynolds number, >= 0
 *  @param k receives K
 *  @return PUMPLOSS_OK, PUMPLOSS_WTRANSITION or an error. @sa pumploss::k_exit_kinetic */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_k_exit_kinetic(double reynolds, double *k);
/** Append a named fitting kind with Reynolds-dependent K.
 *  @param line the handle
 *  @param diameter_m bore, m, > 0 (0: the bore of the element it follows)
 *  @param type PUMPLOSS_FITTING_*
 *  @param method PUMPLOSS_FITTING_METHOD_*
 *  @return PUMPLOSS_OK or an error (element not added). @sa pumploss::line_fitting_named */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_add_fitting_named(pumploss_line *line, double diameter_m, int type,
                                                               int method);
/** Append the exit into the tank with the kinetic energy factor (K = 2 laminar, 1 turbulent).
 *  @param line the handle
 *  @param diameter_m bore, m, > 0 (0: the bore of the element it follows)
 *  @return PUMPLOSS_OK or an error (element not added). @sa pumploss::line_exit */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_add_exit(pumploss_line *line, double diameter_m);
/** Case drain check with the drain flow over temperature, q = q_constant + q_laminar_ref
 *  mu(t_ref)/mu(T), plus an optional destroke peak V/t checked against a separate peak limit.
 *  @param line the drain line (oil set)
 *  @param q_constant_m3_s part independent of viscosity (controller consumption), m^3/s, >= 0
 *  @param q_laminar_ref_m3_s laminar leakage at t_ref_k, m^3/s, >= 0
 *  @param t_ref_k temperature of q_laminar_ref_m3_s, K
 *  @param peak_volume_m3 control volume dumped into the case on destroke, m^3 (0: no peak)
 *  @param peak_time_s time over which it is dumped, s
 *  @param t_cold_k cold-start temperature, K
 *  @param t_max_k maximum temperature, K, >= t_cold_k
 *  @param n_temps number of temperatures, 1 to 1000 (the length of the output arrays)
 *  @param p_tank_pa tank pressure at the outlet, Pa
 *  @param p_allowed_pa allowed continuous case pressure, Pa (same reference)
 *  @param p_allowed_peak_pa allowed peak case pressure, Pa (used with a peak)
 *  @param t_k receives n_temps temperatures, K
 *  @param q_m3_s receives n_temps continuous drain flows, m^3/s
 *  @param case_pressure_pa receives n_temps continuous case pressures, Pa
 *  @param case_pressure_peak_pa receives n_temps peak case pressures, Pa (continuous without a peak)
 *  @param pass receives n_temps flags: bit 0 continuous passes, bit 1 peak passes
 *  @param verdict receives the verdict naming the failing temperature ranges (degC), or "" on error
 *  @param verdict_capacity size of verdict in bytes (the text is cut to fit, always terminated)
 *  @return PUMPLOSS_OK or a report (e.g. PUMPLOSS_WREGIME for a constant K in laminar flow);
 *          errors with NaN outputs. @sa pumploss::drain_check */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_drain_check_flow(
    const pumploss_line *line, double q_constant_m3_s, double q_laminar_ref_m3_s, double t_ref_k,
    double peak_volume_m3, double peak_time_s, double t_cold_k, double t_max_k, size_t n_temps, double p_tank_pa,
    double p_allowed_pa, double p_allowed_peak_pa, double t_k[], double q_m3_s[], double case_pressure_pa[],
    double case_pressure_peak_pa[], int pass[], char *verdict, size_t verdict_capacity);
/** Lowest start temperature: the line passes the continuous and peak limits from there up to
 *  t_max, and the oil is no thicker than the maker's largest start viscosity (inverse ASTM D341).
 *  Drain flow and limits as pumploss_line_drain_check_flow().
 *  @param line the drain line (oil set)
 *  @param q_constant_m3_s constant part, m^3/s
 *  @param q_laminar_ref_m3_s laminar part at t_ref_k, m^3/s
 *  @param t_ref_k reference temperature, K
 *  @param peak_volume_m3 destroke control volume, m^3 (0: none)
 *  @param peak_time_s dump time, s
 *  @param t_cold_k lowest temperature considered, K
 *  @param t_max_k highest temperature, K
 *  @param n_temps grid, 2 to 1000
 *  @param p_tank_pa tank pressure, Pa
 *  @param p_allowed_pa allowed continuous case pressure, Pa
 *  @param p_allowed_peak_pa allowed peak case pressure, Pa
 *  @param nu_max_start_m2_s the maker's largest start viscosity, m^2/s (0: none)
 *  @param t_start_k receives the lowest start temperature, K
 *  @param t_line_k receives the lowest temperature from which the line passes, K
 *  @param t_viscosity_k receives the temperature of the start viscosity (may lie below t_cold; t_cold
 *         without one), K
 *  @return PUMPLOSS_OK or a report; PUMPLOSS_EVALIDITY when the line fails at t_max.
 *  @sa pumploss::drain_start_temperature */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_drain_start(
    const pumploss_line *line, double q_constant_m3_s, double q_laminar_ref_m3_s, double t_ref_k,
    double peak_volume_m3, double peak_time_s, double t_cold_k, double t_max_k, size_t n_temps, double p_tank_pa,
    double p_allowed_pa, double p_allowed_peak_pa, double nu_max_start_m2_s, double *t_start_k, double *t_line_k,
    double *t_viscosity_k);
/** Drain line sizing with the drain flow over temperature and the peak: the smallest standard
 *  bore that passes, the dominant element, and whether the fixed elements (components, static
 *  height) alone exceed a limit. Drain flow and limits as pumploss_line_drain_check_flow().
 *  @param line the drain line (oil set)
 *  @param q_constant_m3_s constant part, m^3/s
 *  @param q_laminar_ref_m3_s laminar part at t_ref_k, m^3/s
 *  @param t_ref_k reference temperature, K
 *  @param peak_volume_m3 destroke control volume, m^3 (0: none)
 *  @param peak_time_s dump time, s
 *  @param t_cold_k cold-start temperature, K
 *  @param t_max_k maximum temperature, K
 *  @param n_temps grid, 2 to 1000
 *  @param p_tank_pa tank pressure, Pa
 *  @param p_allowed_pa allowed continuous case pressure, Pa
 *  @param p_allowed_peak_pa allowed peak case pressure, Pa
 *  @param v_max_m_s largest velocity, m/s
 *  @param kinds_mask 1 tubes, 2 hoses, 3 both
 *  @param diameter_m receives the inside diameter, m
 *  @param fixed_dp_pa receives the largest drop of the fixed elements over the range (where they
 *         exceed a limit, that drop), Pa
 *  @param dominant_element receives the index of the element with the largest drop (-1 none)
 *  @param fixed_exceeds receives 1 when the fixed elements alone exceed a limit (no bore can pass)
 *  @return PUMPLOSS_OK or a report; PUMPLOSS_EVALIDITY when no standard bore passes (the two int
 *          outputs are still set). @sa pumploss::size_drain_line */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_size_drain_flow(
    const pumploss_line *line, double q_constant_m3_s, double q_laminar_ref_m3_s, double t_ref_k,
    double peak_volume_m3, double peak_time_s, double t_cold_k, double t_max_k, size_t n_temps, double p_tank_pa,
    double p_allowed_pa, double p_allowed_peak_pa, double v_max_m_s, int kinds_mask, double *diameter_m,
    double *fixed_dp_pa, int *dominant_element, int *fixed_exceeds);
/** Set the drain flow over temperature as a table on the line (e.g. from a normalisation model),
 *  interpolated linearly, the end values held outside (then PUMPLOSS_WEXTRAPOLATED). While a table
 *  is set, pumploss_line_drain_check_flow(), pumploss_line_drain_start(),
 *  pumploss_line_size_drain_flow() and pumploss_line_drain_fixed_alone() take the continuous
 *  drain flow from it: pass q_constant_m3_s = q_laminar_ref_m3_s = 0 to them (anything else is
 *  PUMPLOSS_EMISUSE: two flow models; t_ref_k is not read); the destroke peak still comes from
 *  their arguments. Changes the handle: not thread-safe against evaluations of the same handle.
 *  @param line the handle
 *  @param count number of points, 1 to 16; 0 (valid arrays) removes the table
 *  @param temperature_k count temperatures, K, > 0, strictly increasing
 *  @param drain_m3_s count drain flows, m^3/s, >= 0
 *  @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN (more than 16 points, temperatures not increasing, a
 *          negative flow), PUMPLOSS_ENONFINITE, PUMPLOSS_EMISUSE (NULL): then the table is
 *          unchanged. @sa pumploss::drain_flow_table */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_set_drain_table(pumploss_line *line, size_t count,
                                                             const double temperature_k[], const double drain_m3_s[]);
/** One element the sizing cannot change (a lumped component, or the static height), alone:
 *  whether p_tank plus its drop exceeds the continuous limit at the continuous drain flow, or
 *  the peak limit at continuous plus peak flow, anywhere in the temperature range, whatever bore
 *  the pipes and fittings get. When pumploss_line_size_drain_flow() says no bore can pass
 *  (fixed_exceeds), call this for index -1 and every element to name each culprit.
 *  Drain flow and limits as pumploss_line_size_drain_flow().
 *  @param line the drain line (oil set)
 *  @param q_constant_m3_s constant part, m^3/s
 *  @param q_laminar_ref_m3_s laminar part at t_ref_k, m^3/s
 *  @param t_ref_k reference temperature, K
 *  @param peak_volume_m3 destroke control volume, m^3 (0: none)
 *  @param peak_time_s dump time, s
 *  @param t_cold_k cold-start temperature, K
 *  @param t_max_k maximum temperature, K
 *  @param n_temps grid, 2 to 1000
 *  @param p_tank_pa tank pressure, Pa
 *  @param p_allowed_pa allowed continuous case pressure, Pa
 *  @param p_allowed_peak_pa allowed peak case pressure, Pa
 *  @param index element index (0 to count - 1) of a component, or -1 for the static height
 *  @param dp_pa receives its drop where it comes closest to (or goes furthest over) a limit, Pa
 *  @param t_k receives the temperature of that drop, K
 *  @param exceeds receives 1 when the element alone exceeds a limit (no bore can help), else 0
 *  @return PUMPLOSS_OK or a report; PUMPLOSS_EDOMAIN for an index out of range or of a pipe or
 *          fitting (their drop depends on the bore); errors with NaN outputs.
 *  @sa pumploss::drain_fixed_alone */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_drain_fixed_alone(
    const pumploss_line *line, double q_constant_m3_s, double q_laminar_ref_m3_s, double t_ref_k,
    double peak_volume_m3, double peak_time_s, double t_cold_k, double t_max_k, size_t n_temps, double p_tank_pa,
    double p_allowed_pa, double p_allowed_peak_pa, int index, double *dp_pa, double *t_k, int *exceeds);
/** @} */

/* ==== efficiency ==== */
/** @name Efficiency, leakage scaling, heat
 *  Pumps and motors have different efficiency definitions (ISO 4409/ISO 4391): for a pump, flow
 *  is the outlet flow it delivers and torque the torque it takes in; for a motor, flow is the
 *  inlet flow it takes in and torque the torque it gives out. @{ */
/**
 * Volumetric, hydromechanical and overall efficiency of a pump:
 * eta_v = q / (V n), eta_hm = V dp / (2 pi T), eta_t = eta_v eta_hm.
 * @param displacement_m3_rev derived displacement V_i, m^3/rev (> 0)
 * @param speed_rev_s rotational frequency n, rev/s (> 0)
 * @param dp_pa pressure rise p_2 - p_1, Pa (> 0)
 * @param flow_m3_s outlet flow at outlet conditions, m^3/s (>= 0)
 * @param torque_n_m input torque, N m (> 0)
 * @param eta_v receives the volumetric efficiency (fraction)
 * @param eta_hm receives the hydromechanical efficiency (fraction)
 * @param eta_t receives the overall efficiency (fraction)
 * @return PUMPLOSS_OK; PUMPLOSS_WIMPLAUSIBLE when an efficiency exceeds 1 (values kept);
 *         PUMPLOSS_EDOMAIN, PUMPLOSS_ENONFINITE, PUMPLOSS_EOVERFLOW, PUMPLOSS_EMISUSE.
 * @sa pumploss::pump_efficiency
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_pump_efficiency(double displacement_m3_rev, double speed_rev_s,
                                                        double dp_pa, double flow_m3_s, double torque_n_m,
                                                        double *eta_v, double *eta_hm, double *eta_t);
/**
 * Volumetric, hydromechanical and overall efficiency of a motor:
 * eta_v = V n / q, eta_hm = 2 pi T / (V dp), eta_t = eta_v eta_hm.
 * @param displacement_m3_rev derived displacement V_i, m^3/rev (> 0)
 * @param speed_rev_s rotational frequency n, rev/s (> 0)
 * @param dp_pa pressure drop p_1 - p_2, Pa (> 0)
 * @param flow_m3_s inlet flow taken in, m^3/s (> 0)
 * @param torque_n_m output torque, N m (>= 0)
 * @param eta_v receives the volumetric efficiency (fraction)
 * @param eta_hm receives the hydromechanical efficiency (fraction)
 * @param eta_t receives the overall efficiency (fraction)
 * @return as pumploss_pump_efficiency(). @sa pumploss::motor_efficiency
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_motor_efficiency(double displacement_m3_rev, double speed_rev_s,
                                                         double dp_pa, double flow_m3_s, double torque_n_m,
                                                         double *eta_v, double *eta_hm, double *eta_t);
/**
 * pumploss_pump_efficiency() for n points (no allocation).
 * @param n number of points
 * @param displacement_m3_rev array of n displacements, m^3/rev
 * @param speed_rev_s array of n speeds, rev/s
 * @param dp_pa array of n pressure rises, Pa
 * @param flow_m3_s array of n outlet flows, m^3/s
 * @param torque_n_m array of n input torques, N m
 * @param eta_v array of n, receives the volumetric efficiencies
 * @param eta_hm array of n, receives the hydromechanical efficiencies
 * @param eta_t array of n, receives the overall efficiencies
 * @param status array of n, receives each point's status (NaN outputs on its error)
 * @return PUMPLOSS_OK; the first report code seen (e.g. PUMPLOSS_WIMPLAUSIBLE); PUMPLOSS_EPARTIAL
 *         when some points failed; PUMPLOSS_EMISUSE for a NULL array.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_pump_efficiency_batch(size_t n, const double *displacement_m3_rev,
                                                              const double *speed_rev_s, const double *dp_pa,
                                                              const double *flow_m3_s, const double *torque_n_m,
                                                              double *eta_v, double *eta_hm, double *eta_t,
                                                              int *status);
/**
 * pumploss_motor_efficiency() for n points (no allocation).
 * @param n number of points
 * @param displacement_m3_rev array of n displacements, m^3/rev
 * @param speed_rev_s array of n speeds, rev/s
 * @param dp_pa array of n pressure drops, Pa
 * @param flow_m3_s array of n inlet flows, m^3/s
 * @param torque_n_m array of n output torques, N m
 * @param eta_v array of n, receives the volumetric efficiencies
 * @param eta_hm array of n, receives the hydromechanical efficiencies
 * @param eta_t array of n, receives the overall efficiencies
 * @param status array of n, receives each point's status
 * @return as pumploss_pump_efficiency_batch().
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_motor_efficiency_batch(size_t n, const double *displacement_m3_rev,
                                                               const double *speed_rev_s, const double *dp_pa,
                                                               const double *flow_m3_s, const double *torque_n_m,
                                                               double *eta_v, double *eta_hm, double *eta_t,
                                                               int *status);
/**
 * Theoretical flow and torque and the hydraulic and shaft powers of a pump point.
 * @param displacement_m3_rev V_i, m^3/rev (> 0)
 * @param speed_rev_s n, rev/s (> 0)
 * @param dp_pa pressure rise, Pa (> 0)
 * @param flow_m3_s outlet flow, m^3/s (>= 0)
 * @param torque_n_m input torque, N m (> 0)
 * @param q_th_m3_s receives V_i n, m^3/s
 * @param torque_th_n_m receives V_i dp / (2 pi), N m
 * @param p_hyd_w receives q dp, W
 * @param p_mech_w receives 2 pi n T, W
 * @return as pumploss_pump_efficiency(). @sa pumploss::pump_efficiency
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_pump_powers(double displacement_m3_rev, double speed_rev_s, double dp_pa,
                                                    double flow_m3_s, double torque_n_m, double *q_th_m3_s,
                                                    double *torque_th_n_m, double *p_hyd_w, double *p_mech_w);
/**
 * Theoretical flow and torque and the hydraulic and shaft powers of a motor point.
 * @param displacement_m3_rev V_i, m^3/rev (> 0)
 * @param speed_rev_s n, rev/s (> 0)
 * @param dp_pa pressure drop, Pa (> 0)
 * @param flow_m3_s inlet flow, m^3/s (> 0)
 * @param torque_n_m output torque, N m (>= 0)
 * @param q_th_m3_s receives V_i n, m^3/s
 * @param torque_th_n_m receives V_i dp / (2 pi), N m
 * @param p_hyd_w receives q dp (power taken in), W
 * @param p_mech_w receives 2 pi n T (power given out), W
 * @return as pumploss_motor_efficiency(). @sa pumploss::motor_efficiency
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_motor_powers(double displacement_m3_rev, double speed_rev_s, double dp_pa,
                                                     double flow_m3_s, double torque_n_m, double *q_th_m3_s,
                                                     double *torque_th_n_m, double *p_hyd_w, double *p_mech_w);
/**
 * Flow at a port from a flow meter reading at another pressure and temperature (same mass flow,
 * exact density ratio, density model of pumploss_oil_density()).
 * @param q_meter_m3_s flow indicated by the meter, m^3/s (>= 0)
 * @param p_meter_pa gauge pressure at the meter, Pa
 * @param t_meter_k temperature at the meter, K (> 0)
 * @param p_port_pa gauge pressure at the port, Pa
 * @param t_port_k temperature at the port, K (> 0)
 * @param rho_ref_kg_m3 oil density at t_ref_k and zero gauge pressure, kg/m^3 (> 0)
 * @param t_ref_k reference temperature of the density, K (> 0)
 * @param alpha_per_k cubic expansion coefficient, 1/K (>= 0)
 * @param bulk_modulus_pa secant bulk modulus, Pa (> |p|)
 * @param q_port_m3_s receives the flow at the port, m^3/s
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME (a state 150 K from the reference); errors.
 * @sa pumploss::flow_at_port
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_flow_at_port(double q_meter_m3_s, double p_meter_pa, double t_meter_k,
                                                     double p_port_pa, double t_port_k, double rho_ref_kg_m3,
                                                     double t_ref_k, double alpha_per_k, double bulk_modulus_pa,
                                                     double *q_port_m3_s);
/**
 * Linearised flow correction q_port = q_meter (1 - (p_port - p_meter)/K - alpha (t_meter - t_port)).
 * @param q_meter_m3_s flow indicated by the meter, m^3/s (>= 0)
 * @param p_meter_pa gauge pressure at the meter, Pa
 * @param t_meter_k temperature at the meter, K
 * @param p_port_pa gauge pressure at the port, Pa
 * @param t_port_k temperature at the port, K
 * @param alpha_per_k cubic expansion coefficient, 1/K (>= 0)
 * @param bulk_modulus_pa bulk modulus, Pa (> 0)
 * @param q_port_m3_s receives the flow at the port, m^3/s
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME when the correction exceeds 5 %; errors.
 * @sa pumploss::flow_at_port_linear
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_flow_at_port_linear(double q_meter_m3_s, double p_meter_pa,
                                                            double t_meter_k, double p_port_pa, double t_port_k,
                                                            double alpha_per_k, double bulk_modulus_pa,
                                                            double *q_port_m3_s);
/**
 * Laminar leakage law q = q_ref (dp / dp_ref) (mu_ref / mu).
 * @param q_ref_m3_s known leakage, m^3/s (>= 0)
 * @param dp_ref_pa its pressure difference, Pa (> 0)
 * @param mu_ref_pa_s its dynamic viscosity, Pa s (> 0)
 * @param dp_pa pressure difference wanted, Pa (>= 0)
 * @param mu_pa_s dynamic viscosity wanted, Pa s (> 0)
 * @param q_m3_s receives the leakage, m^3/s
 * @return PUMPLOSS_OK or an error. @sa pumploss::leakage_scale
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_leakage_scale(double q_ref_m3_s, double dp_ref_pa, double mu_ref_pa_s,
                                                      double dp_pa, double mu_pa_s, double *q_m3_s);
/**
 * pumploss_leakage_scale() for n points (no allocation).
 * @param n number of points
 * @param q_ref_m3_s array of n known leakages, m^3/s
 * @param dp_ref_pa array of n reference pressure differences, Pa
 * @param mu_ref_pa_s array of n reference viscosities, Pa s
 * @param dp_pa array of n pressure differences wanted, Pa
 * @param mu_pa_s array of n viscosities wanted, Pa s
 * @param q_m3_s array of n, receives the leakages, m^3/s
 * @param status array of n, receives each point's status
 * @return PUMPLOSS_OK, PUMPLOSS_EPARTIAL or PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_leakage_scale_batch(size_t n, const double *q_ref_m3_s,
                                                            const double *dp_ref_pa, const double *mu_ref_pa_s,
                                                            const double *dp_pa, const double *mu_pa_s,
                                                            double *q_m3_s, int *status);
/**
 * Power-law leakage scaling q = q_ref (dp/dp_ref)^a (mu_ref/mu)^b.
 * @param q_ref_m3_s known leakage, m^3/s (>= 0)
 * @param dp_ref_pa its pressure difference, Pa (> 0)
 * @param mu_ref_pa_s its dynamic viscosity, Pa s (> 0)
 * @param dp_pa pressure difference wanted, Pa (>= 0)
 * @param mu_pa_s dynamic viscosity wanted, Pa s (> 0)
 * @param a pressure exponent, [0, 2]
 * @param b viscosity exponent, [0, 2]
 * @param q_m3_s receives the leakage, m^3/s
 * @return PUMPLOSS_OK or an error. @sa pumploss::leakage_scale_power_law
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_leakage_scale_power_law(double q_ref_m3_s, double dp_ref_pa,
                                                                double mu_ref_pa_s, double dp_pa, double mu_pa_s,
                                                                double a, double b, double *q_m3_s);
/**
 * Normalise a case drain reading to a reference pressure and temperature (viscosity from the
 * ASTM D341 line through two points, density expanded about t_ref_k with alpha_per_k).
 * @param q_m3_s drain reading, m^3/s (>= 0)
 * @param dp_pa its pressure difference, Pa (> 0)
 * @param t_k its oil temperature, K (> 0)
 * @param dp_ref_pa reference pressure difference, Pa (> 0)
 * @param t_ref_k reference temperature, K (> 0)
 * @param t1_k first D341 point temperature, K
 * @param nu1_m2_s kinematic viscosity at t1_k, m^2/s
 * @param t2_k second D341 point temperature, K
 * @param nu2_m2_s kinematic viscosity at t2_k, m^2/s
 * @param alpha_per_k cubic expansion coefficient, 1/K (>= 0)
 * @param a pressure exponent (1 laminar), [0, 2]
 * @param b viscosity exponent (1 laminar), [0, 2]
 * @param q_ref_m3_s receives the normalised drain flow, m^3/s
 * @return PUMPLOSS_OK, PUMPLOSS_WREGIME or an error. @sa pumploss::leakage_normalise
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_leakage_normalise(double q_m3_s, double dp_pa, double t_k,
                                                          double dp_ref_pa, double t_ref_k, double t1_k,
                                                          double nu1_m2_s, double t2_k, double nu2_m2_s,
                                                          double alpha_per_k, double a, double b,
                                                          double *q_ref_m3_s);
/**
 * Leakage through laminar and square-law resistances in series, dp = R_lam q + R_t q^2.
 * @param r_lam_pa_s_m3 laminar resistance, Pa s/m^3 (>= 0)
 * @param r_t_pa_s2_m6 square-law resistance, Pa s^2/m^6 (>= 0; not both zero)
 * @param dp_pa pressure difference, Pa (>= 0)
 * @param q_m3_s receives the flow, m^3/s
 * @return PUMPLOSS_OK or an error. @sa pumploss::leakage_series
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_leakage_series(double r_lam_pa_s_m3, double r_t_pa_s2_m6, double dp_pa,
                                                       double *q_m3_s);
/**
 * Fit q = k dp^a mu^-b to drain readings (least squares in logarithms, Householder QR).
 * @param count number of readings (>= 4)
 * @param q_m3_s array of readings, m^3/s (> 0)
 * @param dp_pa array of pressure differences, Pa (> 0)
 * @param mu_pa_s array of dynamic viscosities, Pa s (> 0)
 * @param k receives k (SI)
 * @param a receives the pressure exponent
 * @param b receives the viscosity exponent
 * @param cond receives the condition number of the column-scaled design matrix
 * @return PUMPLOSS_OK; PUMPLOSS_WILLCONDITIONED; PUMPLOSS_EDATA; PUMPLOSS_ENOMEM; errors.
 * @sa pumploss::leakage_fit_power_law
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_leakage_fit_power_law(size_t count, const double *q_m3_s,
                                                              const double *dp_pa, const double *mu_pa_s,
                                                              double *k, double *a, double *b, double *cond);
/**
 * Split drain readings into viscous (dp/mu), orifice-like (sqrt(dp)) and constant parts by
 * non-negative least squares (Lawson-Hanson).
 * @param count number of readings (>= 4)
 * @param q_m3_s array of readings, m^3/s (>= 0)
 * @param dp_pa array of pressure differences, Pa (> 0)
 * @param mu_pa_s array of dynamic viscosities, Pa s (> 0)
 * @param c_viscous_m3 receives the coefficient of dp/mu, m^3
 * @param c_orifice_m3_s_pa05 receives the coefficient of sqrt(dp), m^3/(s Pa^0.5)
 * @param c_constant_m3_s receives the constant part, m^3/s
 * @return PUMPLOSS_OK; PUMPLOSS_ENOCONVERGE; PUMPLOSS_EDATA; PUMPLOSS_ENOMEM; errors.
 * @sa pumploss::leakage_split
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_leakage_split(size_t count, const double *q_m3_s, const double *dp_pa,
                                                      const double *mu_pa_s, double *c_viscous_m3,
                                                      double *c_orifice_m3_s_pa05, double *c_constant_m3_s);
/**
 * Temperature rise of throttled oil dT = dp / (rho cp) (all work stays in the oil).
 * @param dp_pa pressure drop, Pa (>= 0)
 * @param rho_kg_m3 density, kg/m^3 (> 0)
 * @param cp_j_kg_k specific heat, J/(kg K) (> 0)
 * @param dt_k receives the temperature rise, K
 * @return PUMPLOSS_OK or an error. @sa pumploss::throttle_temperature_rise
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_throttle_temperature_rise(double dp_pa, double rho_kg_m3,
                                                                  double cp_j_kg_k, double *dt_k);
/**
 * Isenthalpic throttle temperature rise dT = (1 - alpha T) dp / (rho cp).
 * @param dp_pa pressure drop, Pa (>= 0)
 * @param rho_kg_m3 density, kg/m^3 (> 0)
 * @param cp_j_kg_k specific heat, J/(kg K) (> 0)
 * @param alpha_per_k cubic expansion coefficient, 1/K (>= 0)
 * @param t_k oil temperature, K (> 0)
 * @param dt_k receives the temperature rise, K
 * @return PUMPLOSS_OK or an error. @sa pumploss::throttle_temperature_rise_isenthalpic
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_throttle_temperature_rise_isenthalpic(double dp_pa, double rho_kg_m3,
                                                                              double cp_j_kg_k,
                                                                              double alpha_per_k, double t_k,
                                                                              double *dt_k);
/**
 * Heat load P_in (1 - eta_t) of a pump (P_in shaft power) or motor (P_in hydraulic power).
 * @param input_power_w power taken in, W (>= 0)
 * @param eta_t overall efficiency, fraction (>= 0)
 * @param heat_w receives the heat load, W
 * @return PUMPLOSS_OK; PUMPLOSS_WIMPLAUSIBLE for eta_t above 1; errors. @sa pumploss::heat_load
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_heat_load(double input_power_w, double eta_t, double *heat_w);
/**
 * Case drain temperature when a power leaves with the drain flow: T3 = T1 + P / (rho cp q3).
 * @param t_inlet_k inlet oil temperature, K (> 0)
 * @param power_w power carried by the drain flow, W (>= 0)
 * @param drain_flow_m3_s drain flow, m^3/s (> 0)
 * @param rho_kg_m3 density, kg/m^3 (> 0)
 * @param cp_j_kg_k specific heat, J/(kg K) (> 0)
 * @param t_drain_k receives the drain temperature, K
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME for a rise above 100 K; errors.
 * @sa pumploss::case_drain_temperature
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_case_drain_temperature(double t_inlet_k, double power_w,
                                                               double drain_flow_m3_s, double rho_kg_m3,
                                                               double cp_j_kg_k, double *t_drain_k);
/**
 * Case drain temperature from the leakage power dp q3 plus further losses carried by the drain.
 * @param t_inlet_k inlet oil temperature, K (> 0)
 * @param dp_pa pressure drop from the working port to the case, Pa (>= 0)
 * @param drain_flow_m3_s drain flow, m^3/s (> 0)
 * @param extra_power_w further losses carried by the drain, W (>= 0)
 * @param rho_kg_m3 density, kg/m^3 (> 0)
 * @param cp_j_kg_k specific heat, J/(kg K) (> 0)
 * @param t_drain_k receives the drain temperature, K
 * @return as pumploss_case_drain_temperature(). @sa pumploss::case_drain_temperature_from_leakage
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_case_drain_temperature_from_leakage(double t_inlet_k, double dp_pa,
                                                                            double drain_flow_m3_s,
                                                                            double extra_power_w,
                                                                            double rho_kg_m3, double cp_j_kg_k,
                                                                            double *t_drain_k);
/**
 * Derived displacement, estimator A: slope of flow over speed at one low pressure.
 * @param count number of points (>= 3)
 * @param speed_rev_s array of speeds, rev/s (> 0, not all equal)
 * @param flow_m3_s array of flows, m^3/s (>= 0)
 * @param v_m3_rev receives V_i, m^3/rev
 * @param u_v_m3_rev receives its standard error, m^3/rev
 * @return PUMPLOSS_OK; PUMPLOSS_EDATA; errors. @sa pumploss::displacement_slope
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_displacement_slope(size_t count, const double *speed_rev_s,
                                                           const double *flow_m3_s, double *v_m3_rev,
                                                           double *u_v_m3_rev);
/**
 * Derived displacement, estimator B: zero-pressure intercept at one speed (as ISO 8426-2:2025).
 * @param count number of points (>= 3)
 * @param speed_rev_s the shaft speed, rev/s (> 0)
 * @param dp_pa array of pressure differences, Pa (>= 0, not all equal)
 * @param flow_m3_s array of flows, m^3/s (>= 0)
 * @param v_m3_rev receives V_i, m^3/rev
 * @param u_v_m3_rev receives its standard error, m^3/rev
 * @return PUMPLOSS_OK; PUMPLOSS_EDATA; errors. @sa pumploss::displacement_intercept
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_displacement_intercept(size_t count, double speed_rev_s,
                                                               const double *dp_pa, const double *flow_m3_s,
                                                               double *v_m3_rev, double *u_v_m3_rev);
/**
 * Derived displacement, estimator C: two-step method over speeds and pressures (as ISO 8426-1:2025).
 * @param levels number of pressure levels (>= 3; ISO 8426-1 asks >= 5)
 * @param per_level number of speeds per level (>= 3; ISO 8426-1 asks >= 5)
 * @param speed_rev_s array of levels*per_level speeds, rev/s, level by level
 * @param dp_pa array of the same layout, Pa
 * @param flow_m3_s array of the same layout, m^3/s
 * @param v_m3_rev receives V_i, m^3/rev
 * @param u_v_m3_rev receives its standard error, m^3/rev
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME for fewer than 5 x 5 points; PUMPLOSS_EDATA; errors.
 * @sa pumploss::displacement_two_step
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_displacement_two_step(size_t levels, size_t per_level,
                                                              const double *speed_rev_s, const double *dp_pa,
                                                              const double *flow_m3_s, double *v_m3_rev,
                                                              double *u_v_m3_rev);
/** @} */
/** @name Fitted loss models (opaque handle)
 *  A pumploss_model holds a Wilson or Schloesser loss model fitted to test points, its
 *  diagnostics and its per-point residuals. Create with pumploss_model_create(), release with
 *  pumploss_model_destroy(). Reading a handle from several threads is safe; there is no global
 *  state. @{ */
/** Opaque fitted loss model. */
typedef struct pumploss_model pumploss_model;
/** Machine kind for pumploss_model_create(): a pump. */
#define PUMPLOSS_PUMP 0
/** Machine kind for pumploss_model_create(): a motor. */
#define PUMPLOSS_MOTOR 1
/** Model kind: Wilson (slip, viscous, Coulomb, constant torque). */
#define PUMPLOSS_MODEL_WILSON 0
/** Model kind: Wilson plus turbulent slip (sqrt(dp)) and hydrodynamic torque (speed^2). */
#define PUMPLOSS_MODEL_SCHLOESSER 1
/**
 * Fit a loss model to test points (linear least squares, Householder QR with column scaling).
 * @param machine_kind PUMPLOSS_PUMP or PUMPLOSS_MOTOR
 * @param model_kind PUMPLOSS_MODEL_WILSON or PUMPLOSS_MODEL_SCHLOESSER
 * @param displacement_m3_rev derived displacement V_i, m^3/rev (> 0)
 * @param rho_kg_m3 oil density for the Schloesser terms, kg/m^3 (> 0)
 * @param count number of points (more than 3 Wilson, 4 Schloesser)
 * @param dp_pa array of pressure differences, Pa (> 0)
 * @param speed_rev_s array of speeds, rev/s (> 0)
 * @param mu_pa_s array of dynamic viscosities at the gaps, Pa s (> 0)
 * @param flow_m3_s array of flows (pump outlet, motor inlet), m^3/s (>= 0)
 * @param torque_n_m array of torques (pump input, motor output), N m (>= 0)
 * @param model receives the handle on success and on reports (PUMPLOSS_WILLCONDITIONED...);
 *        NULL on every error, like every create function of the API.
 * @return PUMPLOSS_OK; PUMPLOSS_WILLCONDITIONED (coefficients uncertain); PUMPLOSS_EDATA;
 *         PUMPLOSS_EDOMAIN (also for an unknown machine or model kind); PUMPLOSS_ENONFINITE;
 *         PUMPLOSS_EOVERFLOW (finite data that overflow the fit, e.g. flows near the largest
 *         double); PUMPLOSS_EMISUSE (NULL array); PUMPLOSS_ENOMEM. @sa pumploss::fit_loss_model
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_create(int machine_kind, int model_kind, double displacement_m3_rev,
                                                     double rho_kg_m3, size_t count, const double *dp_pa,
                                                     const double *speed_rev_s, const double *mu_pa_s,
                                                     const double *flow_m3_s, const double *torque_n_m,
                                                     pumploss_model **model);
/**
 * Release a model. NULL is a no-op.
 * @param model the handle (or NULL)
 */
PUMPLOSS_API void PUMPLOSS_CALL pumploss_model_destroy(pumploss_model *model);
/**
 * A sentence on the fit: kind, points, R^2, RMS residuals, condition numbers, or why it failed.
 * @param model the handle (NULL gives a sentence saying so)
 * @return a string owned by the handle, valid until pumploss_model_destroy(); never NULL.
 */
PUMPLOSS_API const char *PUMPLOSS_CALL pumploss_model_last_message(const pumploss_model *model);
/**
 * Fitted coefficients (terms absent from the model are 0).
 * @param model the handle
 * @param c_s receives the laminar slip coefficient
 * @param c_st receives the turbulent slip coefficient
 * @param c_v receives the viscous drag coefficient
 * @param c_f receives the Coulomb friction coefficient
 * @param t_c_n_m receives the constant torque loss, N m
 * @param c_h receives the hydrodynamic torque coefficient
 * @return the fit's status (PUMPLOSS_OK, PUMPLOSS_WILLCONDITIONED or its error);
 *         PUMPLOSS_EMISUSE for NULL.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_coefficients(const pumploss_model *model, double *c_s, double *c_st,
                                                           double *c_v, double *c_f, double *t_c_n_m,
                                                           double *c_h);
/**
 * Standard errors of the fitted coefficients (0 for absent terms).
 * @param model the handle
 * @param u_c_s receives u(C_s)
 * @param u_c_st receives u(C_st)
 * @param u_c_v receives u(C_v)
 * @param u_c_f receives u(C_f)
 * @param u_t_c_n_m receives u(T_c), N m
 * @param u_c_h receives u(C_h)
 * @return as pumploss_model_coefficients().
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_standard_errors(const pumploss_model *model, double *u_c_s,
                                                              double *u_c_st, double *u_c_v, double *u_c_f,
                                                              double *u_t_c_n_m, double *u_c_h);
/**
 * Fit diagnostics.
 * @param model the handle
 * @param r2_flow receives R^2 of the flow-loss regression
 * @param r2_torque receives R^2 of the torque-loss regression
 * @param rms_flow_m3_s receives the RMS flow residual, m^3/s
 * @param rms_torque_n_m receives the RMS torque residual, N m
 * @param cond_flow receives the condition number of the column-scaled flow design matrix
 * @param cond_torque receives the condition number of the column-scaled torque design matrix
 * @return as pumploss_model_coefficients().
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_diagnostics(const pumploss_model *model, double *r2_flow,
                                                          double *r2_torque, double *rms_flow_m3_s,
                                                          double *rms_torque_n_m, double *cond_flow,
                                                          double *cond_torque);
/**
 * Residuals per point (measured minus fitted), in the order the points were given.
 * @param model the handle
 * @param count length of the two arrays (at least the number of points)
 * @param flow_residual_m3_s array of count, receives the flow residuals, m^3/s (NaN beyond the points)
 * @param torque_residual_n_m array of count, receives the torque residuals, N m (NaN beyond the points)
 * @return as pumploss_model_coefficients(); PUMPLOSS_EBUFFER when count is too small;
 *         PUMPLOSS_WUNDEFINED instead of a usable status when count exceeds the number of points.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_residuals(const pumploss_model *model, size_t count,
                                                        double flow_residual_m3_s[], double torque_residual_n_m[]);
/**
 * Flow, torque and efficiencies predicted at one operating point.
 * @param model the handle
 * @param dp_pa pressure difference, Pa (> 0)
 * @param speed_rev_s speed, rev/s (> 0)
 * @param mu_pa_s dynamic viscosity at the gaps, Pa s (> 0)
 * @param flow_m3_s receives the flow, m^3/s
 * @param torque_n_m receives the torque, N m
 * @param eta_v receives the volumetric efficiency
 * @param eta_hm receives the hydromechanical efficiency
 * @param eta_t receives the overall efficiency
 * @return PUMPLOSS_OK; PUMPLOSS_WEXTRAPOLATED outside the data's ranges; the fit's status; errors.
 * @sa pumploss::loss_model_predict
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_predict(const pumploss_model *model, double dp_pa,
                                                      double speed_rev_s, double mu_pa_s, double *flow_m3_s,
                                                      double *torque_n_m, double *eta_v, double *eta_hm,
                                                      double *eta_t);
/**
 * Overall-efficiency map over a grid of pressures and speeds at one viscosity:
 * eta_t[i * n_speed + j] for dp_pa[i] and speed_rev_s[j].
 * @param model the handle
 * @param mu_pa_s dynamic viscosity at the gaps, Pa s (> 0)
 * @param n_dp number of pressures
 * @param dp_pa array of n_dp pressures, Pa
 * @param n_speed number of speeds
 * @param speed_rev_s array of n_speed speeds, rev/s
 * @param eta_t array of n_dp * n_speed, receives the overall efficiencies
 * @param status array of n_dp * n_speed, receives each point's status
 * @return PUMPLOSS_OK; the first report seen; PUMPLOSS_EPARTIAL; PUMPLOSS_EMISUSE.
 * @sa pumploss::loss_model_map
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_map(const pumploss_model *model, double mu_pa_s, size_t n_dp,
                                                  const double *dp_pa, size_t n_speed, const double *speed_rev_s,
                                                  double eta_t[], int status[]);
/** @} */

/** @name Measurement uncertainty (GUM, JCGM 100:2008)
 *  State each instrument's uncertainty yourself: no accuracy-class presets are provided. @{ */
#define PUMPLOSS_FIGURE_ABSOLUTE 0           /**< The figure is in the reading's unit (SI). */
#define PUMPLOSS_FIGURE_PERCENT_OF_READING 1 /**< The figure is per cent of the reading. */
#define PUMPLOSS_DIST_STANDARD 0             /**< The figure is a standard uncertainty u. */
#define PUMPLOSS_DIST_RECTANGULAR 1          /**< Limits +/- a, rectangular: u = a/sqrt(3). */
#define PUMPLOSS_DIST_EXPANDED_K2 2          /**< An expanded uncertainty with k = 2: u = U/2. */
/**
 * Standard uncertainty of a reading from an instrument's stated figure.
 * @param figure the figure: absolute (SI) or per cent of reading (>= 0)
 * @param percent_of_reading PUMPLOSS_FIGURE_ABSOLUTE: figure is absolute;
 *        PUMPLOSS_FIGURE_PERCENT_OF_READING: per cent of reading
 * @param distribution PUMPLOSS_DIST_STANDARD: figure is a standard uncertainty;
 *        PUMPLOSS_DIST_RECTANGULAR: rectangular limits (u = a/sqrt(3));
 *        PUMPLOSS_DIST_EXPANDED_K2: expanded with k = 2 (u = U/2)
 * @param reading the reading, SI (for per cent of reading)
 * @param u receives the standard uncertainty, SI
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_EMISUSE for a bad option. @sa pumploss::standard_uncertainty
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_standard_uncertainty(double figure, int percent_of_reading,
                                                             int distribution, double reading, double *u);
/**
 * Standard uncertainty of p_2 - p_1: u^2 = u_1^2 + u_2^2 - 2 r u_1 u_2.
 * @param u_p1_pa standard uncertainty of p_1, Pa (>= 0)
 * @param u_p2_pa standard uncertainty of p_2, Pa (>= 0)
 * @param r12 correlation coefficient, [-1, 1]
 * @param u_dp_pa receives u(dp), Pa
 * @return PUMPLOSS_OK or an error. @sa pumploss::pressure_difference_uncertainty
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_pressure_difference_uncertainty(double u_p1_pa, double u_p2_pa,
                                                                        double r12, double *u_dp_pa);
/**
 * Combined standard uncertainties of a pump's efficiencies (GUM first order, exact sensitivities;
 * multiply by 2 for the expanded uncertainty, k = 2).
 * @param displacement_m3_rev V_i, m^3/rev (> 0)
 * @param speed_rev_s n, rev/s (> 0)
 * @param dp_pa pressure rise, Pa (> 0)
 * @param flow_m3_s outlet flow, m^3/s (>= 0)
 * @param torque_n_m input torque, N m (> 0)
 * @param u_displacement_m3_rev standard uncertainty of V_i, m^3/rev (>= 0)
 * @param u_speed_rev_s standard uncertainty of n, rev/s (>= 0)
 * @param u_dp_pa standard uncertainty of dp, Pa (>= 0)
 * @param u_flow_m3_s standard uncertainty of the flow, m^3/s (>= 0)
 * @param u_torque_n_m standard uncertainty of the torque, N m (>= 0)
 * @param r_flow_displacement correlation of flow and V_i, [-1, 1] (near 1 when V_i was derived
 *        with the same flow meter)
 * @param u_eta_v receives u(eta_v)
 * @param u_eta_hm receives u(eta_hm)
 * @param u_eta_t receives u(eta_t)
 * @return the efficiency status (PUMPLOSS_OK, PUMPLOSS_WIMPLAUSIBLE) or an error.
 * @sa pumploss::efficiency_gum
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_pump_efficiency_uncertainty(
    double displacement_m3_rev, double speed_rev_s, double dp_pa, double flow_m3_s, double torque_n_m,
    double u_displacement_m3_rev, double u_speed_rev_s, double u_dp_pa, double u_flow_m3_s, double u_torque_n_m,
    double r_flow_displacement, double *u_eta_v, double *u_eta_hm, double *u_eta_t);
/**
 * Combined standard uncertainties of a motor's efficiencies (as the pump version).
 * @param displacement_m3_rev V_i, m^3/rev (> 0)
 * @param speed_rev_s n, rev/s (> 0)
 * @param dp_pa pressure drop, Pa (> 0)
 * @param flow_m3_s inlet flow, m^3/s (> 0)
 * @param torque_n_m output torque, N m (>= 0)
 * @param u_displacement_m3_rev standard uncertainty of V_i, m^3/rev (>= 0)
 * @param u_speed_rev_s standard uncertainty of n, rev/s (>= 0)
 * @param u_dp_pa standard uncertainty of dp, Pa (>= 0)
 * @param u_flow_m3_s standard uncertainty of the flow, m^3/s (>= 0)
 * @param u_torque_n_m standard uncertainty of the torque, N m (>= 0)
 * @param r_flow_displacement correlation of flow and V_i, [-1, 1]
 * @param u_eta_v receives u(eta_v)
 * @param u_eta_hm receives u(eta_hm)
 * @param u_eta_t receives u(eta_t)
 * @return as pumploss_pump_efficiency_uncertainty().
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_motor_efficiency_uncertainty(
    double displacement_m3_rev, double speed_rev_s, double dp_pa, double flow_m3_s, double torque_n_m,
    double u_displacement_m3_rev, double u_speed_rev_s, double u_dp_pa, double u_flow_m3_s, double u_torque_n_m,
    double r_flow_displacement, double *u_eta_v, double *u_eta_hm, double *u_eta_t);
/** @} */
/* ---- loss models with constant and compression flow columns ---- */
#define PUMPLOSS_FLOW_TERM_CONSTANT 1     /**< Extra flow column: constant flow loss Q_c. */
#define PUMPLOSS_FLOW_TERM_COMPRESSION 2  /**< Extra flow column: compression C_k D omega dp / K. */
#define PUMPLOSS_CRITERION_AIC 0          /**< Model choice by Akaike's information criterion. */
#define PUMPLOSS_CRITERION_BIC 1          /**< Model choice by the Bayesian (Schwarz) criterion. */
/**
 * Fit a loss model with optional constant and compression flow columns, the subset chosen by an
 * information criterion, and the displacement's uncertainty in every coefficient's error.
 * @param machine_kind PUMPLOSS_PUMP or PUMPLOSS_MOTOR
 * @param model_kind PUMPLOSS_MODEL_WILSON or PUMPLOSS_MODEL_SCHLOESSER
 * @param displacement_m3_rev derived displacement V_i, m^3/rev (> 0)
 * @param u_displacement_m3_rev its standard uncertainty, m^3/rev (>= 0; 0: not propagated)
 * @param rho_kg_m3 oil density for the Schloesser terms, kg/m^3 (> 0)
 * @param bulk_modulus_pa K of the compression column, Pa (> 0)
 * @param flow_terms PUMPLOSS_FLOW_TERM_* bits offered to the criterion (0: plain model)
 * @param criterion PUMPLOSS_CRITERION_AIC or PUMPLOSS_CRITERION_BIC
 * @param count number of points
 * @param dp_pa array of pressure differences, Pa (> 0)
 * @param speed_rev_s array of speeds, rev/s (> 0)
 * @param mu_pa_s array of dynamic viscosities at the gaps, Pa s (> 0)
 * @param flow_m3_s array of flows, m^3/s (>= 0)
 * @param torque_n_m array of torques, N m (>= 0)
 * @param model receives the handle (NULL on every error)
 * @return as pumploss_model_create(); PUMPLOSS_EDOMAIN for unknown bits or criterion.
 * @sa pumploss::fit_loss_model
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_create_terms(int machine_kind, int model_kind,
                                                           double displacement_m3_rev, double u_displacement_m3_rev,
                                                           double rho_kg_m3, double bulk_modulus_pa, int flow_terms,
                                                           int criterion, size_t count, const double *dp_pa,
                                                           const double *speed_rev_s, const double *mu_pa_s,
                                                           const double *flow_m3_s, const double *torque_n_m,
                                                           pumploss_model **model);
/**
 * The extra flow terms of a fitted model.
 * @param model the handle
 * @param flow_terms receives the PUMPLOSS_FLOW_TERM_* bits the criterion kept
 * @param q_c_m3_s receives the constant flow loss, m^3/s (0 when not kept)
 * @param u_q_c_m3_s receives its standard error, m^3/s
 * @param c_k receives the compression coefficient (0 when not kept)
 * @param u_c_k receives its standard error
 * @return the model's status; PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_flow_terms(const pumploss_model *model, int *flow_terms,
                                                         double *q_c_m3_s, double *u_q_c_m3_s, double *c_k,
                                                         double *u_c_k);
/**
 * Information criteria and residual diagnostics of the flow regression.
 * @param model the handle
 * @param aic receives Akaike's criterion of the kept flow model
 * @param bic receives the Bayesian criterion
 * @param corr_dp receives the correlation of the flow residuals with pressure
 * @param corr_speed receives their correlation with speed
 * @param corr_mu receives their correlation with viscosity
 * @param max_std_residual receives the largest |residual| / s
 * @return the model's status; PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_flow_diagnostics(const pumploss_model *model, double *aic, double *bic,
                                                               double *corr_dp, double *corr_speed, double *corr_mu,
                                                               double *max_std_residual);

/* ==== pump ==== */
/** @name Pump health from field readings
 *  Drain fraction and a verdict with reasons (see pumploss::assess_health). Default bands are
 *  common practice of the trade (no source): about 5 % of maximum displacement flow for a
 *  high-quality pump at maximum pressure, up to about 10 % for very large pumps, 15 % or more for
 *  small, poorly made or worn pumps. @{ */
/**
 * Drain fraction: case drain flow over maximum displacement flow, q_V3 / (V_max n).
 * @param drain_flow_m3_s case drain flow, m^3/s (>= 0)
 * @param max_displacement_m3_rev maximum displacement, m^3/rev (> 0)
 * @param speed_rev_s shaft speed, rev/s (> 0)
 * @param fraction receives the fraction (0.05 = 5 %)
 * @return PUMPLOSS_OK; PUMPLOSS_WIMPLAUSIBLE above 1; PUMPLOSS_EDOMAIN, PUMPLOSS_ENONFINITE,
 *         PUMPLOSS_EMISUSE. @sa pumploss::drain_fraction
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_drain_fraction(double drain_flow_m3_s, double max_displacement_m3_rev,
                                                       double speed_rev_s, double *fraction);

#define PUMPLOSS_HEALTH_SOUND 0      /**< Verdict level: sound. */
#define PUMPLOSS_HEALTH_ACCEPTABLE 1 /**< Verdict level: acceptable. */
#define PUMPLOSS_HEALTH_ELEVATED 2   /**< Verdict level: elevated, plan an inspection. */
#define PUMPLOSS_HEALTH_WORN 3       /**< Verdict level: worn. */
#define PUMPLOSS_REASON_FRACTION_SOUND 0x001      /**< Normalised fraction within the sound band. */
#define PUMPLOSS_REASON_FRACTION_ACCEPTABLE 0x002 /**< Normalised fraction within the acceptable band. */
#define PUMPLOSS_REASON_FRACTION_ELEVATED 0x004   /**< Normalised fraction between acceptable and worn. */
#define PUMPLOSS_REASON_FRACTION_WORN 0x008       /**< Normalised fraction at or beyond the worn band. */
#define PUMPLOSS_REASON_GROWTH_MODERATE 0x010     /**< Growth over the baseline beyond the watch limit. */
#define PUMPLOSS_REASON_GROWTH_LARGE 0x020        /**< Growth over the baseline beyond the worn limit. */
#define PUMPLOSS_REASON_DRAIN_HOT 0x040           /**< Drain hotter than throttling alone explains. */
#define PUMPLOSS_REASON_LOW_PRESSURE 0x080        /**< Reading below half the reference pressure. */
#define PUMPLOSS_REASON_NO_BASELINE 0x100         /**< No baseline: growth not assessed. */
#define PUMPLOSS_REASON_NO_TEMPERATURES 0x200     /**< No drain/inlet temperature: heat not assessed. */

/** Opaque health assessor: one pump, one oil, a reference state, bands and an optional baseline. */
typedef struct pumploss_health pumploss_health;

/**
 * Create a health assessor.
 * @param max_displacement_m3_rev maximum displacement, m^3/rev (> 0)
 * @param reference_dp_pa reference pressure difference outlet to case, Pa (> 0; usually the maximum)
 * @param reference_t_k reference oil temperature, K (> 0)
 * @param t1_k first oil viscosity point: temperature, K
 * @param nu1_m2_s first oil viscosity point: kinematic viscosity, m^2/s
 * @param t2_k second oil viscosity point: temperature, K
 * @param nu2_m2_s second oil viscosity point: kinematic viscosity, m^2/s
 * @param rho_kg_m3 oil density, kg/m^3 (> 0)
 * @param cp_j_kg_k oil specific heat, J/(kg K) (> 0)
 * @param out receives the new handle (NULL on error); free it with pumploss_health_destroy()
 * @return PUMPLOSS_OK, PUMPLOSS_EDOMAIN, PUMPLOSS_ENONFINITE, PUMPLOSS_EMISUSE, PUMPLOSS_ENOMEM.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_create(double max_displacement_m3_rev, double reference_dp_pa,
                                                      double reference_t_k, double t1_k, double nu1_m2_s,
                                                      double t2_k, double nu2_m2_s, double rho_kg_m3,
                                                      double cp_j_kg_k, pumploss_health **out);
/** Destroy a health assessor; NULL is a no-op.
 *  @param h the handle */
PUMPLOSS_API void PUMPLOSS_CALL pumploss_health_destroy(pumploss_health *h);
/**
 * Set the bands (defaults: 0.05, 0.10, 0.15, 0.25, 0.50, 1.0).
 * @param h the handle
 * @param sound_max drain fraction up to which a pump is sound (> 0)
 * @param acceptable_max upper end of the acceptable band (>= sound_max)
 * @param worn_min fraction from which a pump is worn (>= acceptable_max)
 * @param growth_moderate growth over baseline flagged moderate (> 0; 0.25 = +25 %)
 * @param growth_large growth over baseline flagged large (>= growth_moderate)
 * @param hot_margin drain rise flagged above hot_margin x dp/(rho cp) (> 0)
 * @return PUMPLOSS_OK, PUMPLOSS_EDOMAIN, PUMPLOSS_ENONFINITE, PUMPLOSS_EMISUSE (NULL handle).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_set_bands(pumploss_health *h, double sound_max, double acceptable_max,
                                                         double worn_min, double growth_moderate,
                                                         double growth_large, double hot_margin);
/**
 * Set the pump's baseline: its drain flow at the reference state when new (or after overhaul).
 * @param h the handle
 * @param baseline_m3_s baseline drain flow at the reference state, m^3/s (> 0)
 * @return PUMPLOSS_OK, PUMPLOSS_EDOMAIN, PUMPLOSS_ENONFINITE, PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_set_baseline(pumploss_health *h, double baseline_m3_s);
/**
 * Set the exponents of the normalisation q ~ dp^a mu^-b (defaults 1, 1: laminar clearances).
 * @param h the handle
 * @param pressure_exponent a (0 to 2)
 * @param viscosity_exponent b (0 to 2)
 * @return PUMPLOSS_OK, PUMPLOSS_EDOMAIN, PUMPLOSS_ENONFINITE, PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_set_exponents(pumploss_health *h, double pressure_exponent,
                                                             double viscosity_exponent);
/**
 * Assess one field reading.
 * @param h the handle
 * @param drain_flow_m3_s case drain flow, m^3/s (>= 0)
 * @param outlet_pa outlet pressure (gauge), Pa
 * @param case_pa case pressure (gauge), Pa (0 if not measured; outlet - case > 0)
 * @param oil_t_k oil temperature governing the clearances, K
 * @param speed_rev_s shaft speed, rev/s (> 0)
 * @param drain_t_k drain oil temperature, K; NaN when not measured
 * @param inlet_t_k inlet oil temperature, K; NaN when not measured
 * @param level receives the level (PUMPLOSS_HEALTH_*; -1 on error)
 * @param reasons receives the reason bits (PUMPLOSS_REASON_*; 0 on error)
 * @param fraction receives the drain fraction as read
 * @param fraction_at_reference receives the drain fraction normalised to the reference state
 * @return PUMPLOSS_OK, PUMPLOSS_WIMPLAUSIBLE (fraction above 1), PUMPLOSS_EDOMAIN,
 *         PUMPLOSS_ENONFINITE (NaN/inf in a required input, inf in a temperature), PUMPLOSS_EMISUSE.
 *         The growth over the baseline is given by pumploss_health_growth().
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_assess(const pumploss_health *h, double drain_flow_m3_s,
                                                      double outlet_pa, double case_pa, double oil_t_k,
                                                      double speed_rev_s, double drain_t_k, double inlet_t_k,
                                                      int *level, int *reasons, double *fraction,
                                                      double *fraction_at_reference);
/**
 * Growth of a reading's normalised drain flow over the pump's baseline.
 * @param h the handle (baseline set with pumploss_health_set_baseline())
 * @param drain_flow_m3_s case drain flow, m^3/s (>= 0)
 * @param outlet_pa outlet pressure (gauge), Pa
 * @param case_pa case pressure (gauge), Pa
 * @param oil_t_k oil temperature governing the clearances, K
 * @param growth receives q_ref / q_baseline - 1 (0.3 = +30 %)
 * @return PUMPLOSS_OK; PUMPLOSS_EDATA when no baseline is set; PUMPLOSS_EDOMAIN,
 *         PUMPLOSS_ENONFINITE, PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_growth(const pumploss_health *h, double drain_flow_m3_s,
                                                      double outlet_pa, double case_pa, double oil_t_k,
                                                      double *growth);
/** A sentence for one reason bit.
 *  @param reason one PUMPLOSS_REASON_* bit
 *  @return the sentence (static storage, never NULL); a sentence saying so for an unknown bit */
PUMPLOSS_API const char *PUMPLOSS_CALL pumploss_health_reason_text(int reason);
/** The name of a level.
 *  @param level a PUMPLOSS_HEALTH_* value
 *  @return "sound", "acceptable", "elevated", "worn", or "unknown" (static storage) */
PUMPLOSS_API const char *PUMPLOSS_CALL pumploss_health_level_name(int level);

/* -- health, version 2: one normalisation model, plausibility, streaming monitor -- */
#define PUMPLOSS_REASON_SPEED_OFF_RATED 0x400     /**< Speed away from rated (flag). */
#define PUMPLOSS_REASON_DRAIN_COLDER 0x800        /**< Drain colder than inlet: sensors swapped? (flag) */
#define PUMPLOSS_REASON_STATE_DIFFERS 0x1000      /**< Operating state differs from the baseline's: heat not assessed. */
#define PUMPLOSS_REASON_BELOW_CONSTANT 0x2000     /**< Reading mostly the constant part: laminar part uncertain. */
#define PUMPLOSS_REFUSE_DRAIN_NOT_POSITIVE 0x01   /**< Refused: zero or negative drain. */
#define PUMPLOSS_REFUSE_DRAIN_BELOW_CONSTANT 0x02 /**< Refused: drain below the controller's constant consumption. */
#define PUMPLOSS_REFUSE_OIL_TEMPERATURE 0x04      /**< Refused: oil temperature outside what oil can be at. */
#define PUMPLOSS_REFUSE_DRAIN_TEMPERATURE 0x08    /**< Refused: drain temperature outside what oil can be at. */
#define PUMPLOSS_REFUSE_SPEED 0x10                /**< Refused: speed far from rated. */
#define PUMPLOSS_REFUSE_PRESSURE_TOO_LOW 0x20     /**< Refused: pressure too low to judge. */
#define PUMPLOSS_REFUSE_FRACTION_ABOVE_ONE 0x40   /**< Refused: normalised drain above the displacement flow. */
#define PUMPLOSS_STATE_UNKNOWN 0   /**< Operating state not recorded. */
#define PUMPLOSS_STATE_ON_STROKE 1 /**< Operating state: delivering flow at the outlet pressure. */
#define PUMPLOSS_STATE_DEADHEAD 2  /**< Operating state: compensated to zero flow (churning heat). */
#define PUMPLOSS_MONITOR_LEARNING 0x01         /**< Monitor event: still learning. */
#define PUMPLOSS_MONITOR_BASELINE_LEARNED 0x02 /**< Monitor event: learning completed with this reading. */
#define PUMPLOSS_MONITOR_REFUSED 0x04          /**< Monitor event: reading refused (see the status). */
#define PUMPLOSS_MONITOR_STEP_UP 0x08          /**< Monitor event: abrupt step up: a jump beyond the local trend (tabular CUSUM, confirmed by 5 readings). */
#define PUMPLOSS_MONITOR_STEP_DOWN 0x10        /**< Monitor event: abrupt step down. */
#define PUMPLOSS_MONITOR_SHIFT 0x20            /**< Monitor event: gradual level shift. */
#define PUMPLOSS_MONITOR_LEVEL_CHANGED 0x40    /**< Monitor event: the confirmed verdict changed. */
#define PUMPLOSS_MONITOR_PENDING 0x80          /**< Monitor event: another level pending (debounce). */
/** Length (doubles) of a saved monitor state, layout version 2. */
#define PUMPLOSS_HEALTH_MONITOR_STATE_COUNT 96

/**
 * Describe the pump for health without geometry (version 2 model).
 * Normalisation: q_ref = q_c + (q - q_c) / F with F = (1 - s)(dp/dp_ref)(mu_ref/mu) + s sqrt(dp/dp_ref),
 * mu the dynamic viscosity at the gap temperature; drain fraction against V_max n_ref.
 * @param h the handle
 * @param constant_m3_s constant part q_c (controller consumption), m^3/s (>= 0, below the baseline)
 * @param orifice_share share s of the variable part that scales as sqrt(dp), 0..1 (0: laminar)
 * @param reference_speed_rev_s speed of the displacement flow of the drain fraction, rev/s (> 0)
 * @param rated_speed_rev_s rated speed for the speed check, rev/s (> 0)
 * @return PUMPLOSS_OK, PUMPLOSS_EDOMAIN, PUMPLOSS_ENONFINITE, PUMPLOSS_EMISUSE.
 * @sa pumploss::health_normalise
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_set_description(pumploss_health *h, double constant_m3_s,
                                                               double orifice_share, double reference_speed_rev_s,
                                                               double rated_speed_rev_s);
/**
 * Set the pump's own baseline drain temperature rise (drain minus inlet) at the reference state,
 * against which the hot-drain indicator compares (scaled by dp/dp_ref, flagged above 1.5 x).
 * @param h the handle
 * @param rise_k baseline rise, K (>= 0)
 * @param state PUMPLOSS_STATE_ON_STROKE or PUMPLOSS_STATE_DEADHEAD: the state it was read in
 * @return PUMPLOSS_OK, PUMPLOSS_EDOMAIN, PUMPLOSS_ENONFINITE, PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_set_baseline_rise(pumploss_health *h, double rise_k, int state);
/**
 * Check and assess one reading with the version 2 model (after pumploss_health_set_description()).
 * @param h the handle (read only)
 * @param drain_flow_m3_s case drain flow, m^3/s
 * @param outlet_pa outlet pressure (gauge), Pa
 * @param case_pa case pressure (gauge), Pa
 * @param oil_t_k oil temperature at the gaps, K
 * @param speed_rev_s shaft speed, rev/s
 * @param drain_t_k drain temperature, K; NaN when not measured
 * @param inlet_t_k inlet temperature, K; NaN when not measured
 * @param state PUMPLOSS_STATE_*
 * @param level receives the level (-1 on error)
 * @param reasons receives PUMPLOSS_REASON_* bits (0 on error)
 * @param refused receives PUMPLOSS_REFUSE_* bits (set with PUMPLOSS_EVALIDITY)
 * @param drain_at_reference_m3_s receives the normalised drain, m^3/s
 * @param fraction_at_reference receives the normalised drain over V_max n_ref
 * @param growth receives the growth over the baseline (0 without one; see PUMPLOSS_REASON_NO_BASELINE)
 * @return PUMPLOSS_OK; PUMPLOSS_WIMPLAUSIBLE; PUMPLOSS_EVALIDITY for a refused reading;
 *         PUMPLOSS_EDOMAIN, PUMPLOSS_ENONFINITE, PUMPLOSS_EMISUSE (also without a description).
 * @sa pumploss::assess_health
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_assess_v2(const pumploss_health *h, double drain_flow_m3_s,
                                                         double outlet_pa, double case_pa, double oil_t_k,
                                                         double speed_rev_s, double drain_t_k, double inlet_t_k,
                                                         int state, int *level, int *reasons, int *refused,
                                                         double *drain_at_reference_m3_s,
                                                         double *fraction_at_reference, double *growth);
/**
 * Fit the constant part and the baseline from baseline readings of a new pump at two or more
 * pressures (laminar part scaled by dp/mu).
 * @param h the handle (oil and reference state)
 * @param drain_flow_m3_s readings, m^3/s (> 0)
 * @param dp_pa their outlet-to-case pressures, Pa (> 0)
 * @param oil_t_k their gap temperatures, K
 * @param count number of readings, 2 to 64
 * @param constant_m3_s receives the constant part, m^3/s
 * @param baseline_m3_s receives the baseline at the reference state, m^3/s
 * @return PUMPLOSS_OK; PUMPLOSS_WIMPLAUSIBLE when the fitted constant was negative (refitted
 *         through zero); PUMPLOSS_EDATA for one value of dp/mu; PUMPLOSS_EDOMAIN, ...
 * @sa pumploss::health_fit_constant
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_fit_constant(const pumploss_health *h, const double drain_flow_m3_s[],
                                                            const double dp_pa[], const double oil_t_k[],
                                                            size_t count, double *constant_m3_s,
                                                            double *baseline_m3_s);
/**
 * Whether a temperature column read as degC looks like degF values.
 * @param t_k the temperatures as read, converted to K (NaN skipped)
 * @param count number of values (<= 4096)
 * @param looks receives 1 when it looks like degF, else 0
 * @return PUMPLOSS_OK, PUMPLOSS_EDOMAIN (too many values), PUMPLOSS_EMISUSE.
 * @sa pumploss::health_temperatures_look_fahrenheit
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_looks_fahrenheit(const double t_k[], size_t count, int *looks);
/** A sentence for one refusal bit.
 *  @param refusal one PUMPLOSS_REFUSE_* bit
 *  @return the sentence (static storage, never NULL) */
PUMPLOSS_API const char *PUMPLOSS_CALL pumploss_health_refusal_text(int refusal);
/** The case-drain caution for reports and screens that show a health verdict: lines separated
 *  by '\n' (never block, cap or valve a drain; a "sound" verdict is not a clearance to run).
 *  @return the text (static storage, never NULL) */
PUMPLOSS_API const char *PUMPLOSS_CALL pumploss_health_caution(void);

/** Opaque streaming health monitor (constant memory, no allocation after creation). Feeding
 *  mutates it (one writer at a time); pumploss_health_monitor_state() and _save() only read it. */
typedef struct pumploss_health_monitor pumploss_health_monitor;
/**
 * Create a monitor from a described health handle (pumploss_health_set_description(); its
 * baseline, or none to learn one, and its bands are copied).
 * @param h the health handle
 * @param learn_count readings that learn the noise and CUSUM target (and the baseline), 2 to 100000 (12 or more: a noise learned from fewer readings lets chance runs pass as steps)
 * @param debounce_count readings a new level must hold, 1 to 100000
 * @param hysteresis relative margin below a band edge to step down a level, 0 to 0.5
 * @param out receives the monitor (NULL on error)
 * @return PUMPLOSS_OK, PUMPLOSS_EDOMAIN, PUMPLOSS_ENONFINITE, PUMPLOSS_EMISUSE, PUMPLOSS_ENOMEM.
 * @sa pumploss::health_monitor
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_monitor_create(const pumploss_health *h, size_t learn_count,
                                                              size_t debounce_count, double hysteresis,
                                                              pumploss_health_monitor **out);
/** Destroy a monitor; NULL is a no-op.
 *  @param m the monitor */
PUMPLOSS_API void PUMPLOSS_CALL pumploss_health_monitor_destroy(pumploss_health_monitor *m);
/**
 * Feed one reading (a mutation: takes a non-const handle; never allocates).
 * @param m the monitor
 * @param time the reading's time (days or operating hours, >= 0), for step times
 * @param drain_flow_m3_s case drain flow, m^3/s
 * @param outlet_pa outlet pressure (gauge), Pa
 * @param case_pa case pressure (gauge), Pa
 * @param oil_t_k oil temperature at the gaps, K
 * @param speed_rev_s shaft speed, rev/s
 * @param drain_t_k drain temperature, K (NaN: not measured)
 * @param inlet_t_k inlet temperature, K (NaN: not measured)
 * @param state PUMPLOSS_STATE_*
 * @param level receives the confirmed level (also for a refused reading; -1 on other errors)
 * @param raw_level receives this reading's own level (-1 when refused)
 * @param events receives PUMPLOSS_MONITOR_* bits
 * @param drain_at_reference_m3_s receives the normalised drain, m^3/s
 * @return as pumploss_health_assess_v2().
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_monitor_feed(pumploss_health_monitor *m, double time,
                                                            double drain_flow_m3_s, double outlet_pa,
                                                            double case_pa, double oil_t_k, double speed_rev_s,
                                                            double drain_t_k, double inlet_t_k, int state,
                                                            int *level, int *raw_level, int *events,
                                                            double *drain_at_reference_m3_s);
/**
 * Read the monitor's state (read only).
 * @param m the monitor
 * @param level receives the confirmed level
 * @param baseline_m3_s receives the baseline in use (given or learned), m^3/s
 * @param sigma_m3_s receives the noise of the normalised drain, m^3/s
 * @param level_m3_s receives the current CUSUM level, m^3/s
 * @param last_step_time receives the time of the last abrupt step, -1 when none
 * @return PUMPLOSS_OK; PUMPLOSS_EDATA while learning; PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_monitor_state(const pumploss_health_monitor *m, int *level,
                                                             double *baseline_m3_s, double *sigma_m3_s,
                                                             double *level_m3_s, double *last_step_time);
/**
 * Save the monitor's dynamic state (versioned layout) to a caller buffer.
 * @param m the monitor
 * @param state receives PUMPLOSS_HEALTH_MONITOR_STATE_COUNT values (NaN on error; with
 *        PUMPLOSS_WUNDEFINED, NaN elements are values the monitor has not learned yet)
 * @param capacity length of state, >= PUMPLOSS_HEALTH_MONITOR_STATE_COUNT
 * @return PUMPLOSS_OK, PUMPLOSS_WUNDEFINED (a saved state with values still to be learned),
 *         PUMPLOSS_EBUFFER, PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_monitor_save(const pumploss_health_monitor *m, double state[],
                                                            size_t capacity);
/**
 * Restore a saved state into a monitor created from the same description, bands and settings.
 * @param m the monitor (unchanged on error)
 * @param state the saved values
 * @param count their number, >= PUMPLOSS_HEALTH_MONITOR_STATE_COUNT
 * @return PUMPLOSS_OK; PUMPLOSS_EVALIDITY for another version, description or a damaged buffer;
 *         PUMPLOSS_EBUFFER; PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_monitor_restore(pumploss_health_monitor *m, const double state[],
                                                               size_t count);
/** @} */
/** @name Piston pump leakage budget
 *  A swashplate axial piston pump described by its geometry and clearances (an opaque handle):
 *  leakage of every path to the case, sensitivities, calibration to measured drain flows and the
 *  gap growth that explains a measured drain. See pumploss::piston_pump_budget. @{ */
#define PUMPLOSS_PATH_PISTON_BORE 0   /**< Path: pistons in their bores. */
#define PUMPLOSS_PATH_SLIPPER 1       /**< Path: slipper pads. */
#define PUMPLOSS_PATH_BALL_SOCKET 2   /**< Path: piston balls in their sockets. */
#define PUMPLOSS_PATH_VALVE_INNER 3   /**< Path: valve plate inner sealing land. */
#define PUMPLOSS_PATH_VALVE_OUTER 4   /**< Path: valve plate outer sealing land. */
#define PUMPLOSS_PATH_CONTROLLER 5    /**< Path: controller pilot consumption. */
#define PUMPLOSS_PATH_BLEED 6         /**< Path: controller bleed orifice. */
#define PUMPLOSS_PATH_EXTRA_LAMINAR 7 /**< Path: user laminar path. */
#define PUMPLOSS_PATH_EXTRA_ORIFICE 8 /**< Path: user orifice path. */
#define PUMPLOSS_PATH_CONTROL_PISTON 9 /**< Path: control piston clearance (compensating, at control pressure). */
#define PUMPLOSS_PATH_COUNT 10        /**< Number of paths. */
#define PUMPLOSS_GAP_BORE 0           /**< Gap: piston-bore clearance. */
#define PUMPLOSS_GAP_SLIPPER 1        /**< Gap: slipper land gap. */
#define PUMPLOSS_GAP_BALL 2           /**< Gap: ball-socket clearance. */
#define PUMPLOSS_GAP_VALVE 3          /**< Gap: barrel-valve plate gap. */
#define PUMPLOSS_GAP_COUNT 4          /**< Number of gaps. */
#define PUMPLOSS_GROUP_PISTON 0       /**< Calibration group: pistons. */
#define PUMPLOSS_GROUP_SLIPPER 1      /**< Calibration group: slippers and ball sockets. */
#define PUMPLOSS_GROUP_VALVE_PLATE 2  /**< Calibration group: valve plate lands. */
#define PUMPLOSS_GROUP_CONTROLLER 3   /**< Calibration group: controller consumption and bleed. */
#define PUMPLOSS_GROUP_EXTRA 4        /**< Calibration group: user paths. */
#define PUMPLOSS_GROUP_COUNT 5        /**< Number of calibration groups. */

/** Opaque piston pump description (geometry, clearances, oil, last calibration). */
typedef struct pumploss_piston_pump pumploss_piston_pump;

/**
 * Create a pump description with its pistons; other paths start absent, the oil unset.
 * @param pistons number of pistons (3 or more; usually 7 or 9)
 * @param piston_diameter_m piston diameter, m
 * @param bore_clearance_m radial piston-bore clearance, m (> 0)
 * @param engaged_length_min_m engaged piston-bore length at outer dead centre, m
 * @param pitch_radius_m pitch radius of the bores, m
 * @param max_swash_angle_rad maximum swash angle, rad (0 < angle < pi/4)
 * @param out receives the handle (NULL on error); free with pumploss_piston_pump_destroy()
 * @return PUMPLOSS_OK, PUMPLOSS_EDOMAIN (including more pistons than fit the pitch circle),
 *         PUMPLOSS_ENONFINITE, PUMPLOSS_EMISUSE, PUMPLOSS_ENOMEM.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_create(int pistons, double piston_diameter_m, double bore_clearance_m,
                                                    double engaged_length_min_m, double pitch_radius_m,
                                                    double max_swash_angle_rad, pumploss_piston_pump **out);
/** Destroy a pump description; NULL is a no-op.
 *  @param h the handle */
PUMPLOSS_API void PUMPLOSS_CALL pumploss_piston_pump_destroy(pumploss_piston_pump *h);
/**
 * Piston details.
 * @param h the handle
 * @param eccentricity_ratio piston eccentricity in its bore, 0..1
 * @param high_pressure_share share of pistons on the high-pressure side, (0, 1] (0.5 typical)
 * @return PUMPLOSS_OK or an error (the description is unchanged on error).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_set_piston(pumploss_piston_pump *h, double eccentricity_ratio,
                                                        double high_pressure_share);
/**
 * Slipper pad fed through a capillary in piston and slipper. A gap of 0 removes the path.
 * @param h the handle
 * @param pocket_radius_m pocket (recess) radius, m
 * @param outer_radius_m land outer radius, m (> pocket radius)
 * @param gap_m land gap, m (>= 0)
 * @param feed_diameter_m feed bore diameter, m
 * @param feed_length_m feed bore length, m
 * @return PUMPLOSS_OK or an error (the description is unchanged on error).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_set_slipper(pumploss_piston_pump *h, double pocket_radius_m,
                                                         double outer_radius_m, double gap_m, double feed_diameter_m,
                                                         double feed_length_m);
/**
 * Ball-and-socket clearance path. A clearance of 0 removes the path.
 * @param h the handle
 * @param ball_diameter_m ball diameter, m
 * @param clearance_m radial clearance, m (>= 0)
 * @param length_m sealing length, m
 * @return PUMPLOSS_OK or an error (the description is unchanged on error).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_set_ball(pumploss_piston_pump *h, double ball_diameter_m, double clearance_m,
                                                      double length_m);
/**
 * Valve plate sealing lands of the high-pressure kidney. A gap of 0 removes the paths.
 * @param h the handle
 * @param inner_land_inner_radius_m inner land, inner radius, m
 * @param inner_land_outer_radius_m inner land, outer radius (kidney edge), m
 * @param outer_land_inner_radius_m outer land, inner radius (kidney edge), m
 * @param outer_land_outer_radius_m outer land, outer radius, m
 * @param kidney_arc_rad arc of the high-pressure kidney, rad
 * @param gap_m barrel-valve plate gap, m (>= 0)
 * @return PUMPLOSS_OK or an error (the description is unchanged on error).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_set_valve_plate(pumploss_piston_pump *h, double inner_land_inner_radius_m,
                                                             double inner_land_outer_radius_m,
                                                             double outer_land_inner_radius_m,
                                                             double outer_land_outer_radius_m, double kidney_arc_rad,
                                                             double gap_m);
/**
 * Controller consumption and bleed orifice.
 * @param h the handle
 * @param consumption_m3_s constant pilot consumption to case, m^3/s (>= 0)
 * @param bleed_diameter_m bleed orifice diameter, m (>= 0; 0: none)
 * @param bleed_cd bleed orifice discharge coefficient, (0, 1]
 * @return PUMPLOSS_OK or an error (the description is unchanged on error).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_set_controller(pumploss_piston_pump *h, double consumption_m3_s,
                                                            double bleed_diameter_m, double bleed_cd);
/**
 * User paths: a laminar conductance (q = k dp / mu) and an orifice (q = CdA sqrt(2 dp / rho)).
 * @param h the handle
 * @param conductance_m3 k, m^3 (>= 0)
 * @param orifice_cda_m2 Cd A, m^2 (>= 0)
 * @return PUMPLOSS_OK or an error (the description is unchanged on error).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_set_extra(pumploss_piston_pump *h, double conductance_m3, double orifice_cda_m2);
/**
 * The oil: two viscosity points (ASTM D341) and the density at 15 degC; the other properties
 * are those of a typical mineral oil (pumploss_typical_mineral_oil()).
 * @param h the handle
 * @param t1_k first point temperature, K
 * @param nu1_m2_s first point kinematic viscosity, m^2/s
 * @param t2_k second point temperature, K
 * @param nu2_m2_s second point kinematic viscosity, m^2/s
 * @param rho15_kg_m3 density at 15 degC, kg/m^3
 * @return PUMPLOSS_OK or an error (the description is unchanged on error).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_set_oil(pumploss_piston_pump *h, double t1_k, double nu1_m2_s, double t2_k,
                                                     double nu2_m2_s, double rho15_kg_m3);
/**
 * Geometric maximum displacement, and its mismatch with a stated one.
 * @param h the handle
 * @param stated_m3_rev the maker's stated displacement, m^3/rev, or 0 when none is stated
 * @param displacement_m3_rev receives z (pi d^2/4) 2 R tan(beta_max), m^3/rev
 * @param mismatch receives geometric / stated - 1 (0 when none is stated)
 * @return PUMPLOSS_OK; PUMPLOSS_WIMPLAUSIBLE when they differ by more than 5 %; errors.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_displacement(const pumploss_piston_pump *h, double stated_m3_rev,
                                                          double *displacement_m3_rev, double *mismatch);
/**
 * Predicted case drain flow at an operating point.
 * @param h the handle (oil set)
 * @param outlet_pa outlet gauge pressure, Pa
 * @param case_pa case gauge pressure, Pa (<= outlet)
 * @param speed_rev_s shaft speed, rev/s (> 0)
 * @param displacement_fraction displacement setting, 0..1
 * @param t_k oil temperature, K
 * @param total_m3_s receives the predicted drain flow, m^3/s
 * @param drain_fraction receives total / (V_max n)
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME when a path is not laminar; errors; PUMPLOSS_EMISUSE
 *         when the oil is not set.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_budget(const pumploss_piston_pump *h, double outlet_pa, double case_pa,
                                                    double speed_rev_s, double displacement_fraction, double t_k,
                                                    double *total_m3_s, double *drain_fraction);
/**
 * One path of the budget.
 * @param h the handle (oil set)
 * @param path PUMPLOSS_PATH_*
 * @param outlet_pa outlet gauge pressure, Pa
 * @param case_pa case gauge pressure, Pa
 * @param speed_rev_s shaft speed, rev/s
 * @param displacement_fraction displacement setting, 0..1
 * @param t_k oil temperature, K
 * @param q_m3_s receives the path's flow, m^3/s
 * @param share receives its share of the total
 * @return as pumploss_piston_pump_budget(); PUMPLOSS_EDOMAIN for an unknown path.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_path_flow(const pumploss_piston_pump *h, int path, double outlet_pa,
                                                       double case_pa, double speed_rev_s,
                                                       double displacement_fraction, double t_k, double *q_m3_s,
                                                       double *share);
/**
 * Sensitivity of the predicted drain to one gap (exact, by dual numbers).
 * @param h the handle (oil set)
 * @param gap PUMPLOSS_GAP_*
 * @param outlet_pa outlet gauge pressure, Pa
 * @param case_pa case gauge pressure, Pa
 * @param speed_rev_s shaft speed, rev/s
 * @param displacement_fraction displacement setting, 0..1
 * @param t_k oil temperature, K
 * @param d_total_d_gap_m2_s receives dQ/dh, (m^3/s)/m
 * @param elasticity receives (h/Q) dQ/dh
 * @return as pumploss_piston_pump_budget(); PUMPLOSS_EDOMAIN for an unknown gap.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_gap_sensitivity(const pumploss_piston_pump *h, int gap, double outlet_pa,
                                                             double case_pa, double speed_rev_s,
                                                             double displacement_fraction, double t_k,
                                                             double *d_total_d_gap_m2_s, double *elasticity);
/**
 * The change of one gap alone that explains a measured drain flow.
 * @param h the handle (oil set)
 * @param gap PUMPLOSS_GAP_*
 * @param measured_drain_m3_s measured drain flow, m^3/s (> 0)
 * @param outlet_pa outlet gauge pressure, Pa
 * @param case_pa case gauge pressure, Pa
 * @param speed_rev_s shaft speed, rev/s
 * @param displacement_fraction displacement setting, 0..1
 * @param t_k oil temperature, K
 * @param growth receives k - 1 (0.2: the gap must be 20 % larger)
 * @return PUMPLOSS_OK; PUMPLOSS_EVALIDITY when that gap alone cannot explain it; errors.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_gap_growth(const pumploss_piston_pump *h, int gap, double measured_drain_m3_s,
                                                        double outlet_pa, double case_pa, double speed_rev_s,
                                                        double displacement_fraction, double t_k, double *growth);
/**
 * Calibrate one scale factor per path group to measured drain flows (non-negative least
 * squares); results are kept in the handle (pumploss_piston_pump_calibration_group()).
 * @param h the handle (oil set)
 * @param n number of measurements
 * @param drain_m3_s measured drain flows, m^3/s (n values)
 * @param outlet_pa outlet gauge pressures, Pa (n values)
 * @param case_pa case gauge pressures, Pa (n values)
 * @param speed_rev_s shaft speeds, rev/s (n values)
 * @param displacement_fraction displacement settings, 0..1 (n values)
 * @param t_k oil temperatures, K (n values)
 * @param rms_residual_m3_s receives the root-mean-square residual, m^3/s
 * @return PUMPLOSS_OK; PUMPLOSS_WILLCONDITIONED; PUMPLOSS_EDATA for too few points; errors.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_calibrate(pumploss_piston_pump *h, size_t n, const double *drain_m3_s,
                                                       const double *outlet_pa, const double *case_pa,
                                                       const double *speed_rev_s, const double *displacement_fraction,
                                                       const double *t_k, double *rms_residual_m3_s);
/**
 * Calibrate as pumploss_piston_pump_calibrate(), each measurement with its controller mode (readings on
 * stroke and at deadhead separate the pistons from the other laminar paths).
 * @param h the handle (oil set)
 * @param n number of measurements
 * @param drain_m3_s measured drain flows, m^3/s (n values)
 * @param outlet_pa outlet gauge pressures, Pa (n values)
 * @param case_pa case gauge pressures, Pa (n values)
 * @param speed_rev_s shaft speeds, rev/s (n values)
 * @param displacement_fraction displacement settings, 0..1 (n values)
 * @param t_k oil temperatures, K (n values)
 * @param mode PUMPLOSS_MODE_* of each measurement (n values)
 * @param rms_residual_m3_s receives the root-mean-square residual, m^3/s
 * @return as pumploss_piston_pump_calibrate(); PUMPLOSS_EDOMAIN for an unknown mode.
 * @sa pumploss::calibrate_piston_pump
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_calibrate_modes(pumploss_piston_pump *h, size_t n, const double *drain_m3_s,
                                                             const double *outlet_pa, const double *case_pa,
                                                             const double *speed_rev_s,
                                                             const double *displacement_fraction, const double *t_k,
                                                             const int *mode, double *rms_residual_m3_s);
/**
 * Result of the last calibration for one group.
 * @param h the handle
 * @param group PUMPLOSS_GROUP_*
 * @param scale receives the fitted factor on the group's flow
 * @param std_error receives its standard error (NaN under PUMPLOSS_WUNDEFINED when the
 *        unconstrained fit failed)
 * @param gap_growth receives the equivalent gap change (NaN under PUMPLOSS_WUNDEFINED for a
 *        group without a gap, PUMPLOSS_GROUP_CONTROLLER and PUMPLOSS_GROUP_EXTRA, or when no gap
 *        change reaches the fitted scale)
 * @param confused_with receives a bit set of the groups the data cannot tell from this one
 * @return PUMPLOSS_OK; PUMPLOSS_WUNDEFINED (see std_error, gap_growth); PUMPLOSS_EDATA when no
 *         calibration has been made or the group has no flow in this pump (absent); PUMPLOSS_EDOMAIN
 *         for an unknown group; PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_calibration_group(const pumploss_piston_pump *h, int group, double *scale,
                                                               double *std_error, double *gap_growth,
                                                               int *confused_with);
/** Name of a path.
 *  @param path PUMPLOSS_PATH_*
 *  @return "piston-bore", "slipper", ... or "unknown" (static storage) */
PUMPLOSS_API const char *PUMPLOSS_CALL pumploss_piston_pump_path_name(int path);
/** Name of a calibration group.
 *  @param group PUMPLOSS_GROUP_*
 *  @return "piston", "slipper", ... or "unknown" (static storage) */
PUMPLOSS_API const char *PUMPLOSS_CALL pumploss_piston_pump_group_name(int group);
/* ---- piston pump: kinematics, controller modes, force balance, non-case losses ---- */
#define PUMPLOSS_MODE_ON_STROKE 0     /**< Controller mode: on stroke (control chamber vented). */
#define PUMPLOSS_MODE_COMPENSATING 1  /**< Controller mode: compensating (control piston and bleed at control pressure). */
#define PUMPLOSS_MODE_DEADHEAD 2      /**< Controller mode: deadhead (compensating at zero displacement). */
#define PUMPLOSS_BALANCE_SLIPPER_OVERCLAMPED 1 /**< Balance warning: slipper balance below 0.90. */
#define PUMPLOSS_BALANCE_SLIPPER_LIFTS 2       /**< Balance warning: slipper balance above 1.10. */
#define PUMPLOSS_BALANCE_SLIPPER_NO_FILM 4     /**< Balance warning: the pocket cannot carry the piston force. */
#define PUMPLOSS_BALANCE_BARREL_LIFTS 8        /**< Balance warning: barrel balance above 1.00 (lift-off). */
#define PUMPLOSS_BALANCE_BARREL_OVERCLAMPED 16 /**< Balance warning: barrel balance below 0.85. */

/**
 * Swash-plate pivot and dead volume of the pump (both 0 by default).
 * @param h the handle
 * @param pivot_offset_m distance of the pivot line from the shaft axis towards inner dead centre, m (|e| < R)
 * @param dead_volume_m3 chamber volume at inner dead centre at full displacement, m^3 (>= 0)
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::piston_pump_kinematics
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_set_kinematics(pumploss_piston_pump *h, double pivot_offset_m,
                                                            double dead_volume_m3);
/**
 * Control piston, control pressure, cross-port path and barrel spring (all 0 by default).
 * @param h the handle
 * @param control_piston_conductance_m3 laminar conductance k of the control piston clearance, q = k p_c / mu, m^3
 * @param control_pressure_pa control chamber gauge pressure while compensating, Pa
 * @param cross_port_conductance_m3 laminar conductance high- to low-pressure kidney, m^3 (not to the case)
 * @param barrel_spring_force_n barrel hold-down spring force, N
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN for a negative value; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::piston_pump_budget
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_set_control(pumploss_piston_pump *h, double control_piston_conductance_m3,
                                                         double control_pressure_pa, double cross_port_conductance_m3,
                                                         double barrel_spring_force_n);
/**
 * Kinematics at one displacement setting.
 * @param h the handle
 * @param displacement_fraction 0..1
 * @param stroke_m receives 2 R tan(beta), m
 * @param engaged_odc_m receives the engagement at outer dead centre, m
 * @param engaged_idc_m receives the engagement at inner dead centre, m
 * @param effective_length_m receives sqrt(L_ODC L_IDC), m
 * @param dead_volume_m3 receives the chamber volume at inner dead centre, m^3
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 * @sa pumploss::piston_pump_kinematics
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_kinematics(const pumploss_piston_pump *h, double displacement_fraction,
                                                        double *stroke_m, double *engaged_odc_m,
                                                        double *engaged_idc_m, double *effective_length_m,
                                                        double *dead_volume_m3);
/**
 * Drain budget in a controller mode, with the viscosity band and the force balance.
 * @param h the handle (oil set)
 * @param mode PUMPLOSS_MODE_*
 * @param outlet_pa outlet gauge pressure, Pa
 * @param case_pa case gauge pressure, Pa
 * @param speed_rev_s shaft speed, rev/s
 * @param displacement_fraction displacement setting, 0..1 (taken as 0 at deadhead)
 * @param t_k bulk oil temperature, K
 * @param film_rise_k film temperature rise for the heated bound, K (>= 0)
 * @param total_m3_s receives the isoviscous drain flow, m^3/s
 * @param total_film_m3_s receives the drain flow with the film viscosity, m^3/s
 * @param metering_flow_m3_s receives the spool's metering flow into the control chamber, m^3/s
 * @param warnings receives PUMPLOSS_BALANCE_* bits of the force balance
 * @return PUMPLOSS_OK; PUMPLOSS_WIMPLAUSIBLE when a balance ratio leaves its window;
 *         PUMPLOSS_WREGIME; errors; PUMPLOSS_EDOMAIN for an unknown mode.
 * @sa pumploss::piston_pump_budget
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_budget_mode(const pumploss_piston_pump *h, int mode, double outlet_pa,
                                                         double case_pa, double speed_rev_s,
                                                         double displacement_fraction, double t_k, double film_rise_k,
                                                         double *total_m3_s, double *total_film_m3_s,
                                                         double *metering_flow_m3_s, int *warnings);
/**
 * Force balance: slipper and barrel balance ratios (independent of pressure and viscosity; the
 * barrel's hold-down of the pressurised bores alone, without the spring).
 * @param h the handle (slipper and valve plate set)
 * @param displacement_fraction displacement setting, 0..1
 * @param slipper_balance receives hydrostatic slipper force / (piston force / cos beta) at the stated film
 * @param slipper_film_m receives the film at which the slipper balance is 1, m (0: none)
 * @param barrel_balance receives valve-plate separating force / barrel hold-down
 * @param warnings receives PUMPLOSS_BALANCE_* bits
 * @return PUMPLOSS_OK; PUMPLOSS_WIMPLAUSIBLE outside the design windows; PUMPLOSS_EDATA when the
 *         pump has no slipper or no valve-plate path; errors.
 * @sa pumploss::piston_pump_balance
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_balance(const pumploss_piston_pump *h, double displacement_fraction,
                                                     double *slipper_balance, double *slipper_film_m,
                                                     double *barrel_balance, int *warnings);
/**
 * The test stand's flow loss split into the case drain and the losses that never reach the case.
 * @param h the handle (oil set)
 * @param mode PUMPLOSS_MODE_*
 * @param outlet_pa outlet gauge pressure, Pa
 * @param inlet_pa inlet gauge pressure, Pa (<= outlet)
 * @param case_pa case gauge pressure, Pa
 * @param speed_rev_s shaft speed, rev/s
 * @param displacement_fraction displacement setting, 0..1
 * @param t_k oil temperature, K
 * @param drain_m3_s receives the case drain, m^3/s
 * @param compression_m3_s receives the compression of the delivered oil, m^3/s
 * @param dead_volume_m3_s receives the dead-volume compression loss, m^3/s
 * @param cross_port_m3_s receives the cross-port leakage, m^3/s
 * @param total_m3_s receives their sum: the stand's flow loss, m^3/s
 * @return as pumploss_piston_pump_budget_mode().
 * @sa pumploss::piston_pump_flow_loss
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_flow_loss(const pumploss_piston_pump *h, int mode, double outlet_pa,
                                                       double inlet_pa, double case_pa, double speed_rev_s,
                                                       double displacement_fraction, double t_k, double *drain_m3_s,
                                                       double *compression_m3_s, double *dead_volume_m3_s,
                                                       double *cross_port_m3_s, double *total_m3_s);
/**
 * Standard uncertainty of one path's share from standard uncertainties of the four gaps.
 * @param h the handle (oil set)
 * @param path PUMPLOSS_PATH_*
 * @param u_gap_m standard uncertainty of each gap (PUMPLOSS_GAP_* order), m
 * @param n_gaps number of values in u_gap_m (PUMPLOSS_GAP_COUNT)
 * @param outlet_pa outlet gauge pressure, Pa
 * @param case_pa case gauge pressure, Pa
 * @param speed_rev_s shaft speed, rev/s
 * @param displacement_fraction displacement setting, 0..1
 * @param t_k oil temperature, K
 * @param share receives the share (0 when the total is 0)
 * @param u_share receives its standard uncertainty
 * @return as pumploss_piston_pump_budget(); PUMPLOSS_EDOMAIN for an unknown path, n_gaps other than
 *         PUMPLOSS_GAP_COUNT or a negative uncertainty.
 * @sa pumploss::piston_pump_budget_uncertainty
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_share_uncertainty(const pumploss_piston_pump *h, int path,
                                                               const double *u_gap_m, size_t n_gaps,
                                                               double outlet_pa, double case_pa, double speed_rev_s,
                                                               double displacement_fraction, double t_k,
                                                               double *share, double *u_share);
/** @} */

/* ==== capi ==== */

/* ==== test stand ==== */
/** @name Test-stand data reduction (opaque handles)
 *  The whole reduction of a pump or motor test as one call (pumploss::reduce_test_stand): the
 *  flow corrected to the port, the derived displacement by three estimators (ISO 8426-1),
 *  efficiencies of every point with their expanded uncertainty (GUM, k = 2), Wilson (and
 *  Schloesser) loss models and the overall-efficiency map. A pumploss_test_stand_setup holds how
 *  the test was made (changed by its set functions, not while others use it); a
 *  pumploss_test_stand holds one reduction, computed completely by pumploss_test_stand_create()
 *  and never changed afterwards: its functions only read it, so any number of threads may read
 *  one handle at once. Results are engineering estimates; the pump maker's acceptance rules
 *  govern. @{ */
/** Opaque test-stand setup: machine, oil, flow meter, instruments, method, map grid. */
typedef struct pumploss_test_stand_setup pumploss_test_stand_setup;
/** Opaque reduced test: every result of one reduction (read-only after creation). */
typedef struct pumploss_test_stand pumploss_test_stand;
#define PUMPLOSS_TS_VISCOSITY_INLET 0     /**< Viscosity in the gaps at the inlet temperature. */
#define PUMPLOSS_TS_VISCOSITY_OUTLET 1    /**< ... at the outlet temperature. */
#define PUMPLOSS_TS_VISCOSITY_DRAIN 2     /**< ... at the drain temperature (the default). */
#define PUMPLOSS_TS_DISPLACEMENT_SLOPE 0      /**< Displacement: slope of flow over speed at the lowest pressure. */
#define PUMPLOSS_TS_DISPLACEMENT_INTERCEPT 1  /**< Displacement: zero-pressure intercept at the highest speed. */
#define PUMPLOSS_TS_DISPLACEMENT_TWO_STEP 2   /**< Displacement: two-step method over the grid (the default). */
#define PUMPLOSS_TS_DISPLACEMENT_NOMINAL 3    /**< Displacement: the maker's nominal figure. */
#define PUMPLOSS_TS_DISPLACEMENT_USED 4       /**< pumploss_test_stand_displacement(): the value the efficiencies used. */
#define PUMPLOSS_TS_SPEED 0     /**< Instrument: speed (absolute part in rev/s). */
#define PUMPLOSS_TS_PRESSURE 1  /**< Instrument: pressure (absolute part in Pa). */
#define PUMPLOSS_TS_FLOW 2      /**< Instrument: flow (absolute part in m^3/s). */
#define PUMPLOSS_TS_TORQUE 3    /**< Instrument: torque (absolute part in N m). */
#define PUMPLOSS_TS_STANDARD 0  /**< Instrument figures are standard uncertainties. */
#define PUMPLOSS_TS_LIMITS 1    /**< Instrument figures are limits (rectangular, u = a/sqrt(3)). */
#define PUMPLOSS_TS_METER_AT_PORT 1    /**< The flow meter reads at the port (no correction). */
#define PUMPLOSS_TS_METER_IN_RETURN 0  /**< The meter sits in the return line: corrected to the port. */
/**
 * Create a setup: the machine and its oil (ASTM D341 line through two points; density,
 * expansion and bulk modulus of a typical mineral oil until pumploss_test_stand_setup_set_oil()).
 * Defaults: viscosity at the drain temperature, two-step displacement, Wilson model, meter at
 * the port, no instrument uncertainty, map 29 speeds x 27 pressures (its range must be set).
 * @param machine_kind PUMPLOSS_PUMP or PUMPLOSS_MOTOR
 * @param nominal_displacement_m3_rev the maker's displacement, m^3/rev (> 0)
 * @param t1_k first viscosity point: temperature, K
 * @param nu1_m2_s first viscosity point: kinematic viscosity, m^2/s
 * @param t2_k second viscosity point: temperature, K
 * @param nu2_m2_s second viscosity point: kinematic viscosity, m^2/s
 * @param out receives the handle (NULL on error); free it with pumploss_test_stand_setup_destroy()
 * @return PUMPLOSS_OK, PUMPLOSS_EDOMAIN, PUMPLOSS_ENONFINITE, PUMPLOSS_EMISUSE, PUMPLOSS_ENOMEM.
 * @sa pumploss::test_stand_setup
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_create(int machine_kind, double nominal_displacement_m3_rev,
                                                                double t1_k, double nu1_m2_s, double t2_k,
                                                                double nu2_m2_s, pumploss_test_stand_setup **out);
/** Destroy a setup; NULL is a no-op.
 *  @param setup the handle */
PUMPLOSS_API void PUMPLOSS_CALL pumploss_test_stand_setup_destroy(pumploss_test_stand_setup *setup);
/**
 * The oil's density, expansion and bulk modulus (for the flow correction and the Schloesser terms).
 * @param setup the handle
 * @param rho_kg_m3 density at t_ref_k and zero gauge pressure, kg/m^3 (> 0)
 * @param t_ref_k its temperature, K (> 0)
 * @param alpha_per_k volumetric expansion coefficient, 1/K (0 to 0.01)
 * @param bulk_modulus_pa isothermal secant bulk modulus, Pa (> 0)
 * @return PUMPLOSS_OK or an error (the setup is unchanged on error).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_set_oil(pumploss_test_stand_setup *setup, double rho_kg_m3,
                                                                 double t_ref_k, double alpha_per_k,
                                                                 double bulk_modulus_pa);
/**
 * The method: which temperature sets the viscosity, which displacement the efficiencies use,
 * which loss models are fitted.
 * @param setup the handle
 * @param viscosity_temperature PUMPLOSS_TS_VISCOSITY_INLET, _OUTLET or _DRAIN
 * @param displacement PUMPLOSS_TS_DISPLACEMENT_SLOPE, _INTERCEPT, _TWO_STEP or _NOMINAL
 * @param fit_model PUMPLOSS_MODEL_WILSON, or PUMPLOSS_MODEL_SCHLOESSER to fit both
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN for an unknown choice; PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_set_method(pumploss_test_stand_setup *setup,
                                                                    int viscosity_temperature, int displacement,
                                                                    int fit_model);
/**
 * Where the flow meter sits.
 * @param setup the handle
 * @param meter_position PUMPLOSS_TS_METER_AT_PORT, or PUMPLOSS_TS_METER_IN_RETURN (the readings
 *        then need the meter temperature and the port's temperature)
 * @param meter_pressure_pa gauge pressure at a return-line meter, Pa (-1e5 to 1e8; ignored at the port)
 * @return PUMPLOSS_OK or an error (the setup is unchanged on error).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_set_meter(pumploss_test_stand_setup *setup,
                                                                   int meter_position, double meter_pressure_pa);
/**
 * The stated uncertainty of one instrument: per cent of reading plus an absolute part.
 * @param setup the handle
 * @param instrument PUMPLOSS_TS_SPEED, _PRESSURE, _FLOW or _TORQUE
 * @param reading_percent per cent of reading (0 to 50)
 * @param absolute_si absolute part in the instrument's SI unit (rev/s, Pa, m^3/s, N m; >= 0)
 * @param distribution PUMPLOSS_TS_LIMITS or PUMPLOSS_TS_STANDARD
 * @return PUMPLOSS_OK or an error (the setup is unchanged on error).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_set_instrument(pumploss_test_stand_setup *setup,
                                                                        int instrument, double reading_percent,
                                                                        double absolute_si, int distribution);
/**
 * The grid of the overall-efficiency map and its oil temperature. Optional: without it the map
 * spans the tested speeds and pressures at the mean of the temperature that sets the viscosity
 * (pumploss_test_stand_map_temperature() reads back the one used).
 * @param setup the handle
 * @param speed_lo_rev_s lowest speed, rev/s (>= 0)
 * @param speed_hi_rev_s highest speed, rev/s (> speed_lo_rev_s)
 * @param dp_lo_pa lowest pressure difference, Pa (>= 0)
 * @param dp_hi_pa highest pressure difference, Pa (> dp_lo_pa)
 * @param t_k oil temperature of the map, K: read as the temperature that sets the viscosity
 *        (outside its tested range every map point is extrapolated, and reported)
 * @param speeds number of grid speeds (2 to 10000)
 * @param pressures number of grid pressures (2 to 10000)
 * @return PUMPLOSS_OK or an error (the setup is unchanged on error).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_set_map(pumploss_test_stand_setup *setup,
                                                                 double speed_lo_rev_s, double speed_hi_rev_s,
                                                                 double dp_lo_pa, double dp_hi_pa, double t_k,
                                                                 size_t speeds, size_t pressures);
/* Reading a setup back (const: an embedder shows or logs what was set; any number of threads). */
/**
 * The machine of a setup, as given to pumploss_test_stand_setup_create().
 * @param setup the handle (only read)
 * @param machine_kind receives PUMPLOSS_PUMP or PUMPLOSS_MOTOR (-1 on error)
 * @param nominal_displacement_m3_rev receives the maker's displacement, m^3/rev
 * @return PUMPLOSS_OK, PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_get_machine(const pumploss_test_stand_setup *setup,
                                                                     int *machine_kind,
                                                                     double *nominal_displacement_m3_rev);
/**
 * The kinematic viscosity of the setup's oil at a temperature (its ASTM D341 line through the
 * two points given at creation; pumploss_viscosity_d341() of those points).
 * @param setup the handle (only read)
 * @param t_k oil temperature, K (> 0)
 * @param nu_m2_s receives the kinematic viscosity, m^2/s
 * @return as pumploss_viscosity_d341(): PUMPLOSS_OK, PUMPLOSS_WREGIME (below 0.2 mm^2/s),
 *         PUMPLOSS_EDOMAIN, PUMPLOSS_ENONFINITE, PUMPLOSS_EOVERFLOW, PUMPLOSS_EMISUSE.
 * @sa pumploss::oil_kinematic_viscosity
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_viscosity(const pumploss_test_stand_setup *setup,
                                                                   double t_k, double *nu_m2_s);
/**
 * The oil's density, expansion and bulk modulus (pumploss_test_stand_setup_set_oil(), or the
 * typical mineral oil of pumploss_test_stand_setup_create()).
 * @param setup the handle (only read)
 * @param rho_kg_m3 receives the density at t_ref_k, kg/m^3
 * @param t_ref_k receives its temperature, K
 * @param alpha_per_k receives the volumetric expansion coefficient, 1/K
 * @param bulk_modulus_pa receives the bulk modulus, Pa
 * @return PUMPLOSS_OK, PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_get_oil(const pumploss_test_stand_setup *setup,
                                                                 double *rho_kg_m3, double *t_ref_k,
                                                                 double *alpha_per_k, double *bulk_modulus_pa);
/**
 * The method (pumploss_test_stand_setup_set_method(), or the defaults).
 * @param setup the handle (only read)
 * @param viscosity_temperature receives PUMPLOSS_TS_VISCOSITY_* (-1 on error)
 * @param displacement receives PUMPLOSS_TS_DISPLACEMENT_* (-1 on error)
 * @param fit_model receives PUMPLOSS_MODEL_WILSON or PUMPLOSS_MODEL_SCHLOESSER (-1 on error)
 * @return PUMPLOSS_OK, PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_get_method(const pumploss_test_stand_setup *setup,
                                                                    int *viscosity_temperature, int *displacement,
                                                                    int *fit_model);
/**
 * Where the flow meter sits (pumploss_test_stand_setup_set_meter(), or at the port).
 * @param setup the handle (only read)
 * @param meter_position receives PUMPLOSS_TS_METER_AT_PORT or PUMPLOSS_TS_METER_IN_RETURN (-1 on error)
 * @param meter_pressure_pa receives the gauge pressure at a return-line meter, Pa
 * @return PUMPLOSS_OK, PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_get_meter(const pumploss_test_stand_setup *setup,
                                                                   int *meter_position, double *meter_pressure_pa);
/**
 * The stated uncertainty of one instrument (pumploss_test_stand_setup_set_instrument(); 0 % and
 * 0 as limits until set).
 * @param setup the handle (only read)
 * @param instrument PUMPLOSS_TS_SPEED, _PRESSURE, _FLOW or _TORQUE
 * @param reading_percent receives the per cent of reading
 * @param absolute_si receives the absolute part in the instrument's SI unit
 * @param distribution receives PUMPLOSS_TS_LIMITS or PUMPLOSS_TS_STANDARD (-1 on error)
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN for an unknown instrument; PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_get_instrument(const pumploss_test_stand_setup *setup,
                                                                        int instrument, double *reading_percent,
                                                                        double *absolute_si, int *distribution);
/**
 * The grid of the overall-efficiency map (pumploss_test_stand_setup_set_map()).
 * @param setup the handle (only read)
 * @param speed_lo_rev_s receives the lowest speed, rev/s
 * @param speed_hi_rev_s receives the highest speed, rev/s
 * @param dp_lo_pa receives the lowest pressure difference, Pa
 * @param dp_hi_pa receives the highest pressure difference, Pa
 * @param t_k receives the map's oil temperature, K
 * @param speeds receives the number of grid speeds (the default 29 also before a set_map)
 * @param pressures receives the number of grid pressures (the default 27 also before a set_map)
 * @return PUMPLOSS_OK; PUMPLOSS_EDATA before pumploss_test_stand_setup_set_map() (no range set:
 *         the doubles NaN, the counts still given); PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_get_map(const pumploss_test_stand_setup *setup,
                                                                 double *speed_lo_rev_s, double *speed_hi_rev_s,
                                                                 double *dp_lo_pa, double *dp_hi_pa, double *t_k,
                                                                 size_t *speeds, size_t *pressures);
/**
 * Reduce a test: every result is computed here and kept in the handle.
 * A temperature that was not measured is passed as an array of NaN.
 * @param setup the setup (only read)
 * @param count number of readings
 * @param speed_rev_s speeds, rev/s
 * @param inlet_pressure_pa inlet gauge pressures, Pa
 * @param outlet_pressure_pa outlet gauge pressures, Pa
 * @param flow_m3_s flows as the meter read them (pump outlet, motor inlet), m^3/s
 * @param torque_n_m shaft torques, N m
 * @param drain_flow_m3_s case drain flows, m^3/s
 * @param inlet_t_k inlet temperatures, K
 * @param outlet_t_k outlet temperatures, K (all NaN: not measured)
 * @param drain_t_k drain temperatures, K (all NaN: not measured)
 * @param meter_t_k temperatures at the flow meter, K (all NaN: not measured)
 * @param message receives the first message as a sentence (why an error stopped the reduction,
 *        or the first report), "" when there is none; may be NULL with message_capacity 0
 * @param message_capacity size of message in bytes
 * @param out receives the handle on success and on reports; NULL on every error
 * @return PUMPLOSS_OK; a report (PUMPLOSS_WOUTLIER set points flagged by the outlier test, which
 *         comes first; PUMPLOSS_WEXTRAPOLATED map points, PUMPLOSS_WREGIME,
 *         PUMPLOSS_WILLCONDITIONED, PUMPLOSS_WIMPLAUSIBLE); PUMPLOSS_EDOMAIN (a reading out of
 *         range, pressures the wrong way round), PUMPLOSS_EDATA (too few readings, a needed
 *         temperature missing, no displacement from the chosen estimator), PUMPLOSS_EMISUSE,
 *         PUMPLOSS_ENOMEM, or the failing step's error.
 * @sa pumploss::reduce_test_stand
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_create(const pumploss_test_stand_setup *setup, size_t count,
                                                          const double *speed_rev_s, const double *inlet_pressure_pa,
                                                          const double *outlet_pressure_pa, const double *flow_m3_s,
                                                          const double *torque_n_m, const double *drain_flow_m3_s,
                                                          const double *inlet_t_k, const double *outlet_t_k,
                                                          const double *drain_t_k, const double *meter_t_k,
                                                          char *message, size_t message_capacity,
                                                          pumploss_test_stand **out);
/** Destroy a reduced test; NULL is a no-op.
 *  @param ts the handle */
PUMPLOSS_API void PUMPLOSS_CALL pumploss_test_stand_destroy(pumploss_test_stand *ts);
/**
 * One message of the reduction (reports such as extrapolated map points) as a sentence.
 * @param ts the handle
 * @param index 0 for the first message
 * @param text receives the sentence ("" past the last message)
 * @param text_capacity size of text in bytes
 * @return the message's status code (a report, >= 100); PUMPLOSS_EDATA past the last message;
 *         PUMPLOSS_EBUFFER when the sentence does not fit (cut); PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_message(const pumploss_test_stand *ts, size_t index, char *text,
                                                           size_t text_capacity);
/**
 * A derived displacement with its standard uncertainty.
 * @param ts the handle
 * @param which PUMPLOSS_TS_DISPLACEMENT_SLOPE, _INTERCEPT or _TWO_STEP for that estimator, or
 *        PUMPLOSS_TS_DISPLACEMENT_USED for the value the efficiencies used
 * @param v_m3_rev receives the displacement, m^3/rev
 * @param u_v_m3_rev receives its standard uncertainty, m^3/rev (0 for the nominal figure)
 * @return the estimator's status (PUMPLOSS_OK, PUMPLOSS_WREGIME for a small grid, or
 *         PUMPLOSS_EDATA when it found none); PUMPLOSS_EDOMAIN for an unknown which.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_displacement(const pumploss_test_stand *ts, int which,
                                                                double *v_m3_rev, double *u_v_m3_rev);
/**
 * Efficiencies of every set point with their expanded uncertainties (k = 2). Readings are grouped
 * into set points and averaged (pumploss_test_stand_setup_set_grouping()); with one reading per
 * set point this is one element per reading.
 * @param ts the handle
 * @param count number of set points (pumploss_test_stand_counts())
 * @param eta_v receives the volumetric efficiencies
 * @param U_eta_v receives their expanded uncertainties
 * @param eta_hm receives the hydromechanical efficiencies
 * @param U_eta_hm receives their expanded uncertainties
 * @param eta_t receives the overall efficiencies
 * @param U_eta_t receives their expanded uncertainties
 * @param status receives each point's status (PUMPLOSS_OK or PUMPLOSS_WIMPLAUSIBLE)
 * @return PUMPLOSS_OK; PUMPLOSS_EBUFFER when count differs from the number of readings (outputs NaN).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_points(const pumploss_test_stand *ts, size_t count,
                                                          double eta_v[], double U_eta_v[], double eta_hm[],
                                                          double U_eta_hm[], double eta_t[], double U_eta_t[],
                                                          int status[]);
/**
 * What each reading became: the flow at the port, the pressure difference, the viscosity in the
 * gaps and the drain fraction (drain flow over the theoretical flow V_i n).
 * @param ts the handle
 * @param count number of set points (pumploss_test_stand_counts())
 * @param flow_m3_s receives the flows at the port, m^3/s
 * @param dp_pa receives the pressure differences, Pa
 * @param mu_pa_s receives the viscosities, Pa s
 * @param drain_fraction receives the drain fractions
 * @return PUMPLOSS_OK; PUMPLOSS_EBUFFER when count differs from the number of readings.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_point_flows(const pumploss_test_stand *ts, size_t count,
                                                               double flow_m3_s[], double dp_pa[], double mu_pa_s[],
                                                               double drain_fraction[]);
/**
 * A fitted loss model's coefficients and R^2.
 * @param ts the handle
 * @param model_kind PUMPLOSS_MODEL_WILSON or PUMPLOSS_MODEL_SCHLOESSER
 * @param c_s receives C_s
 * @param c_st receives C_st (0 for Wilson)
 * @param c_v receives C_v
 * @param c_f receives C_f
 * @param t_c_n_m receives T_c, N m
 * @param c_h receives C_h (0 for Wilson)
 * @param r2_flow receives R^2 of the flow regression
 * @param r2_torque receives R^2 of the torque regression
 * @return the fit's status; PUMPLOSS_EDATA when that model was not fitted; PUMPLOSS_EDOMAIN.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_model(const pumploss_test_stand *ts, int model_kind, double *c_s,
                                                         double *c_st, double *c_v, double *c_f, double *t_c_n_m,
                                                         double *c_h, double *r2_flow, double *r2_torque);
/**
 * The overall-efficiency map of a fitted model: eta_t[i * n_speed + j] at the i-th pressure and
 * the j-th speed of the grid (pumploss_test_stand_map_axis()).
 * @param ts the handle
 * @param model_kind PUMPLOSS_MODEL_WILSON or PUMPLOSS_MODEL_SCHLOESSER
 * @param n_dp grid pressures (as set)
 * @param n_speed grid speeds (as set)
 * @param eta_t receives the n_dp * n_speed overall efficiencies (NaN where a point failed)
 * @param status receives each grid point's status (PUMPLOSS_WEXTRAPOLATED outside the tests)
 * @return PUMPLOSS_OK or PUMPLOSS_WEXTRAPOLATED; PUMPLOSS_WPARTIAL when some point failed;
 *         PUMPLOSS_EBUFFER when the sizes differ from the grid; PUMPLOSS_EDATA (model not fitted).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_map(const pumploss_test_stand *ts, int model_kind, size_t n_dp,
                                                       size_t n_speed, double eta_t[], int status[]);
#define PUMPLOSS_TS_AXIS_PRESSURE 0  /**< pumploss_test_stand_map_axis(): the grid's pressure differences, Pa. */
#define PUMPLOSS_TS_AXIS_SPEED 1     /**< pumploss_test_stand_map_axis(): the grid's speeds, rev/s. */
/**
 * One axis of the map's grid.
 * @param ts the handle
 * @param axis PUMPLOSS_TS_AXIS_PRESSURE or PUMPLOSS_TS_AXIS_SPEED
 * @param count number of grid values on that axis (as set)
 * @param values_si receives the values (Pa or rev/s)
 * @return PUMPLOSS_OK; PUMPLOSS_EBUFFER when count differs; PUMPLOSS_EDOMAIN for an unknown axis.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_map_axis(const pumploss_test_stand *ts, int axis, size_t count,
                                                            double values_si[]);
/* ---- issue 16: logged data (set points, steady state, outliers) and acceptance ---- */
/**
 * How rows are grouped into set points and which settling rows are dropped (pumploss::test_stand_setup).
 * Defaults: speed 3 %, pressure difference 5 % or 5 bar (common practice, no source); steady-state
 * limits of ISO 4409 class B (speed and torque 1 %, flow and pressure 1.5 %, temperature 2 K; from memory).
 * @param setup the setup
 * @param speed_percent a row joins a set point within this per cent of its mean speed (0 < x < 50)
 * @param dp_percent ... and within this per cent of its mean pressure difference (0 < x < 50)
 * @param dp_band_pa ... or within this absolute band, Pa (>= 0), whichever is wider
 * @param steady_speed_percent steady-state limit of the speed about the set point's median, % (> 0)
 * @param steady_pressure_percent limit of the pressure difference, % (> 0)
 * @param steady_flow_percent limit of the flow, % (> 0)
 * @param steady_torque_percent limit of the torque, % (> 0)
 * @param steady_temperature_k limit of the viscosity temperature, K (> 0)
 * @param drop_unsteady 1 to drop the settling rows, 0 to average every row
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_set_grouping(pumploss_test_stand_setup *setup,
                                                                      double speed_percent, double dp_percent,
                                                                      double dp_band_pa, double steady_speed_percent,
                                                                      double steady_pressure_percent,
                                                                      double steady_flow_percent,
                                                                      double steady_torque_percent,
                                                                      double steady_temperature_k, int drop_unsteady);
#define PUMPLOSS_TS_OUTLIERS_FLAG 0     /**< Outliers are flagged and reported, and stay in the fit. */
#define PUMPLOSS_TS_OUTLIERS_EXCLUDE 1  /**< Outliers are flagged, reported and excluded from the fit (default). */
/**
 * The outlier test: externally studentized residuals of the flow and torque fits above a threshold
 * (Belsley, Kuh and Welsch 1980).
 * @param setup the setup
 * @param threshold |t| above which a set point is an outlier (> 1; default 3)
 * @param rule PUMPLOSS_TS_OUTLIERS_FLAG or PUMPLOSS_TS_OUTLIERS_EXCLUDE
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_set_outliers(pumploss_test_stand_setup *setup,
                                                                      double threshold, int rule);
/**
 * Exclude the set point of a reading from the fit (the user's list; reported, kept in the tables).
 * @param setup the setup
 * @param row the reading, 0-based (checked against the readings by pumploss_test_stand_create())
 * @return PUMPLOSS_OK; PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_add_exclude_row(pumploss_test_stand_setup *setup, size_t row);
#define PUMPLOSS_TS_ACCEPT_ETA_V 0       /**< Minimum volumetric efficiency at a stated point. */
#define PUMPLOSS_TS_ACCEPT_ETA_HM 1      /**< Minimum hydromechanical efficiency at a stated point. */
#define PUMPLOSS_TS_ACCEPT_ETA_T 2       /**< Minimum overall efficiency at a stated point. */
#define PUMPLOSS_TS_ACCEPT_DRAIN_FLOW 3  /**< Maximum case drain flow, m^3/s, at a stated point (speed 0: every set point). */
/**
 * Add an acceptance criterion, judged at the set point matching (speed, dp) within the grouping tolerances.
 * @param setup the setup
 * @param quantity PUMPLOSS_TS_ACCEPT_ETA_V, _ETA_HM, _ETA_T or _DRAIN_FLOW
 * @param speed_rev_s speed of the stated point, rev/s (>= 0)
 * @param dp_pa pressure difference of the stated point, Pa (>= 0)
 * @param limit minimum efficiency (fraction) or maximum drain flow (m^3/s), >= 0
 * @return PUMPLOSS_OK; PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_add_acceptance(pumploss_test_stand_setup *setup,
                                                                        int quantity, double speed_rev_s,
                                                                        double dp_pa, double limit);
/**
 * Counts of the reduction: set points (the length of every per-point array), readings dropped as
 * settling, outliers flagged, set points excluded from the fit, acceptance criteria.
 * @param ts the handle
 * @param set_points receives the number of set points
 * @param rows_unsteady receives the readings dropped by the steady-state criterion
 * @param outliers receives the set points flagged as outliers
 * @param excluded receives the set points excluded from the fit (rule or list)
 * @param criteria receives the number of acceptance criteria
 * @return PUMPLOSS_OK; PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_counts(const pumploss_test_stand *ts, size_t *set_points,
                                                          size_t *rows_unsteady, size_t *outliers, size_t *excluded,
                                                          size_t *criteria);
/**
 * What each set point was made of: its first reading, the readings averaged and dropped, and the
 * type A standard uncertainties s/sqrt(n) of its mean flow and torque (GUM 4.2.3; 0 for one reading).
 * @param ts the handle
 * @param count number of set points (pumploss_test_stand_counts())
 * @param first_row receives the first reading of each set point, 0-based
 * @param rows receives the readings averaged
 * @param rows_unsteady receives the readings dropped as settling
 * @param ua_flow_m3_s receives the type A of the mean flow, m^3/s
 * @param ua_torque_n_m receives the type A of the mean torque, N m
 * @return PUMPLOSS_OK; PUMPLOSS_EBUFFER when count differs; PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_set_points(const pumploss_test_stand *ts, size_t count,
                                                              size_t first_row[], size_t rows[],
                                                              size_t rows_unsteady[], double ua_flow_m3_s[],
                                                              double ua_torque_n_m[]);
/**
 * The outlier test of each set point.
 * @param ts the handle
 * @param count number of set points
 * @param t_flow receives the externally studentized residual of the flow fit (NaN under
 *        PUMPLOSS_WUNDEFINED where too few points leave it undefined)
 * @param t_torque receives that of the torque fit (likewise)
 * @param outlier receives 0, 1 (flow), 2 (torque) or 3 (both) for |t| above the threshold
 * @param excluded receives 0, 1 (by the rule) or 2 (by the setup's list)
 * @return PUMPLOSS_OK; PUMPLOSS_WUNDEFINED; PUMPLOSS_EBUFFER when count differs; PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_outliers(const pumploss_test_stand *ts, size_t count,
                                                            double t_flow[], double t_torque[], int outlier[],
                                                            int excluded[]);
/**
 * The verdict on one acceptance criterion (in the order added).
 * @param ts the handle
 * @param index 0 for the first criterion
 * @param pass receives 1 when met (margin >= 0), 0 when failed or not tested
 * @param tested receives 1 when a set point matched the stated point
 * @param value receives the measured efficiency or drain flow (SI)
 * @param U receives its expanded uncertainty (k = 2; 0 for the drain flow)
 * @param margin receives value - limit (minimum) or limit - value (maximum)
 * @param point receives the set point judged
 * @return PUMPLOSS_OK; PUMPLOSS_WUNDEFINED when not tested (value, U, margin NaN); PUMPLOSS_EDATA
 *         past the last criterion; PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_acceptance(const pumploss_test_stand *ts, size_t index, int *pass,
                                                              int *tested, double *value, double *U, double *margin,
                                                              size_t *point);
/* ---- the fit status per set point, the map's temperature (issue 16) ---- */
/**
 * The fit status of each set point: the status of the first fitted model's prediction there.
 * A point whose residuals (pumploss_test_stand_points()) are NaN has an error status here saying
 * why; PUMPLOSS_WEXTRAPOLATED for a point outside the fitted range (e.g. an excluded one).
 * @param ts the handle (only read)
 * @param count number of set points
 * @param fit_status receives PUMPLOSS_OK, a report code, or the error that left the residuals NaN
 * @return PUMPLOSS_OK; PUMPLOSS_EBUFFER when count differs; PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_point_fit(const pumploss_test_stand *ts, size_t count,
                                                             int fit_status[]);
/**
 * The temperature of the map: the setup's (pumploss_test_stand_setup_set_map(), read as the
 * temperature that sets the viscosity, PUMPLOSS_TS_VISCOSITY_AT_*) or, when none was stated
 * (a setup without set_map), the mean of that temperature over the set points; and the tested
 * range of that temperature.
 * @param ts the handle (only read)
 * @param t_k receives the map temperature, K
 * @param mu_pa_s receives the oil viscosity at it, Pa s
 * @param tested_lo_k receives the lowest set-point mean of the viscosity temperature, K
 * @param tested_hi_k receives the highest, K
 * @return PUMPLOSS_OK; PUMPLOSS_WEXTRAPOLATED when the map temperature lies outside the tested
 *         range (every map point is then extrapolated in viscosity); PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_map_temperature(const pumploss_test_stand *ts, double *t_k,
                                                                   double *mu_pa_s, double *tested_lo_k,
                                                                   double *tested_hi_k);

/** @} */
/* ==== flowtest ==== */
/** @name Field flow test of any pump
 *  Two flow meter readings (no load and loaded) with the drive's speed (measured, or an induction
 *  motor's slip from its nameplate), laminar leakage corrected to a reference viscosity and
 *  pressure, volumetric efficiency, percent of new and a verdict (see pumploss::flow_test_evaluate).
 *  Results are engineering estimates; the pump maker's data and test procedure govern. @{ */
#define PUMPLOSS_FLOW_PASS 0   /**< Flow test verdict: at or above limit + watch band. */
#define PUMPLOSS_FLOW_WATCH 1  /**< Flow test verdict: between the limit and limit + watch band. */
#define PUMPLOSS_FLOW_FAIL 2   /**< Flow test verdict: below the limit. */
/**
 * Speed of an induction motor at a shaft torque, slip proportional to torque:
 * n = n_s - (n_s - n_r) M / M_r with M_r = P_r / (2 pi n_r).
 * @param sync_speed_rev_s synchronous speed, rev/s (25 for 4 poles at 50 Hz)
 * @param rated_speed_rev_s nameplate speed, rev/s (< synchronous)
 * @param rated_power_w nameplate power, W
 * @param torque_nm shaft torque, N m (>= 0)
 * @param speed_rev_s receives the speed, rev/s
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME above 1.5 times rated torque; PUMPLOSS_EDOMAIN;
 *         PUMPLOSS_EVALIDITY when the torque would stop the motor. @sa pumploss::induction_motor_speed
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_induction_motor_speed(double sync_speed_rev_s, double rated_speed_rev_s,
                                                              double rated_power_w, double torque_nm,
                                                              double *speed_rev_s);
/**
 * Evaluate a field flow test. A speed of 0 takes the reading's speed from the motor's nameplate
 * at the torque V dp / (2 pi eta_hm).
 * @param no_load_flow_m3_s flow with the loading valve open, m^3/s (> 0)
 * @param no_load_pressure_pa its pressure, Pa (>= 0)
 * @param no_load_speed_rev_s its measured drive speed, rev/s, or 0: from the motor
 * @param loaded_flow_m3_s flow at the test pressure, m^3/s (> 0)
 * @param loaded_pressure_pa test pressure, Pa (> no-load pressure)
 * @param loaded_speed_rev_s its measured drive speed, rev/s, or 0: from the motor
 * @param displacement_m3_rev stated displacement, m^3/rev, or 0: derived from the readings
 * @param hydromech_efficiency assumed hydromechanical efficiency for the torque, (0, 1]
 * @param motor_sync_speed_rev_s motor synchronous speed, rev/s (used for speeds of 0)
 * @param motor_rated_speed_rev_s motor nameplate speed, rev/s
 * @param motor_rated_power_w motor nameplate power, W
 * @param mu_test_pa_s oil viscosity during the test, Pa s
 * @param mu_ref_pa_s reference viscosity (the new pump's rating), Pa s
 * @param ref_pressure_pa reference (rated) pressure, Pa
 * @param ref_speed_rev_s reference (rated) speed, rev/s
 * @param new_volumetric_efficiency the new pump's volumetric efficiency at the reference, (0, 1]
 * @param limit percent of new (as a fraction) below which the pump fails (0.85 common practice, no source)
 * @param watch_band band above the limit that reads "watch" (0.05 common practice, no source)
 * @param speed_loaded_rev_s receives the drive speed at the loaded reading, rev/s
 * @param displacement_out_m3_rev receives the displacement used, m^3/rev
 * @param leakage_m3_s receives the leakage at the loaded reading, m^3/s
 * @param volumetric_efficiency receives q_loaded / (V n_loaded)
 * @param uncorrected_ratio receives q_loaded / q_no_load (the raw readings' ratio)
 * @param percent_of_new receives the efficiency at the reference over the new one (fraction)
 * @param verdict receives PUMPLOSS_FLOW_* (-1 on error)
 * @return PUMPLOSS_OK; reports PUMPLOSS_WEXTRAPOLATED, PUMPLOSS_WIMPLAUSIBLE, PUMPLOSS_WREGIME;
 *         errors. @sa pumploss::flow_test_evaluate
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_flow_test(double no_load_flow_m3_s, double no_load_pressure_pa,
                                                  double no_load_speed_rev_s, double loaded_flow_m3_s,
                                                  double loaded_pressure_pa, double loaded_speed_rev_s,
                                                  double displacement_m3_rev, double hydromech_efficiency,
                                                  double motor_sync_speed_rev_s, double motor_rated_speed_rev_s,
                                                  double motor_rated_power_w, double mu_test_pa_s,
                                                  double mu_ref_pa_s, double ref_pressure_pa, double ref_speed_rev_s,
                                                  double new_volumetric_efficiency, double limit, double watch_band,
                                                  double *speed_loaded_rev_s, double *displacement_out_m3_rev,
                                                  double *leakage_m3_s, double *volumetric_efficiency,
                                                  double *uncorrected_ratio, double *percent_of_new, int *verdict);
/** @} */

/** @name Gear and vane pump leakage budgets
 *  Internal leakage of an external gear pump (tooth tips, lateral gaps, mesh estimate) and of a
 *  vane pump (vane tips, side plates, rotor slots) from their clearances, with the exact
 *  sensitivity to each clearance (see pumploss::gear_pump_budget, pumploss::vane_pump_budget).
 *  A handle may be read by many threads at once; change it on one thread. @{ */
#define PUMPLOSS_GEAR_PATH_TIP 0      /**< Gear pump path and clearance: tooth tips against the housing. */
#define PUMPLOSS_GEAR_PATH_LATERAL 1  /**< Gear pump path and clearance: lateral gaps (side plates or bushings). */
#define PUMPLOSS_GEAR_PATH_MESH 2     /**< Gear pump path and clearance: the mesh (stated estimate). */
#define PUMPLOSS_VANE_PATH_TIP 0      /**< Vane pump path and clearance: vane tips against the cam ring. */
#define PUMPLOSS_VANE_PATH_SIDE 1     /**< Vane pump path and clearance: rotor faces against the side plates. */
#define PUMPLOSS_VANE_PATH_SLOT 2     /**< Vane pump path and clearance: vanes in their rotor slots. */
#define PUMPLOSS_ROTARY_PATH_COUNT 3  /**< Number of paths (and clearances) of a gear or vane budget. */

/** Opaque external gear pump description (clearances and oil). */
typedef struct pumploss_gear_pump pumploss_gear_pump;
/**
 * Create a gear pump description (two equal gears); side plates centred over half a turn of
 * each gear face, mesh sealed, oil unset.
 * @param displacement_m3_rev the maker's displacement, m^3/rev
 * @param shaft_radius_m shaft (bearing bore) radius, drained to the inlet, m
 * @param lateral_land_m root radius minus shaft radius (the lateral sealing land), m
 * @param tooth_height_m tip radius minus root radius, m
 * @param face_width_m gear face width, m
 * @param tip_land_m width of one tooth's tip land along the circumference, m
 * @param teeth_sealing teeth of one gear sealing against the housing in series (>= 1)
 * @param tip_clearance_m radial tip clearance, m
 * @param lateral_clearance_m total end float of a gear (side plates), m
 * @param out receives the handle (NULL on error); free with pumploss_gear_pump_destroy()
 * @return PUMPLOSS_OK, PUMPLOSS_EDOMAIN, PUMPLOSS_ENONFINITE, PUMPLOSS_EMISUSE, PUMPLOSS_ENOMEM.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gear_pump_create(double displacement_m3_rev, double shaft_radius_m,
                                                         double lateral_land_m, double tooth_height_m,
                                                         double face_width_m, double tip_land_m, int teeth_sealing,
                                                         double tip_clearance_m, double lateral_clearance_m,
                                                         pumploss_gear_pump **out);
/** Destroy a gear pump description; NULL is a no-op.
 *  @param h the handle */
PUMPLOSS_API void PUMPLOSS_CALL pumploss_gear_pump_destroy(pumploss_gear_pump *h);
/**
 * Lateral gaps: fixed side plates (clearance = end float, split by the offset) or pressure-
 * balanced bushings (clearance = film per side).
 * @param h the handle
 * @param clearance_m end float (side plates) or film per side (bushings), m
 * @param balanced_bushings 1 for pressure-balanced bushings, 0 for side plates
 * @param offset_ratio axial offset of a gear in its end float, 0 (centred) .. < 1
 * @param arc_rad arc of each gear face under outlet pressure, rad, (0, 2 pi]
 * @return PUMPLOSS_OK or an error (the description is unchanged on error).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gear_pump_set_lateral(pumploss_gear_pump *h, double clearance_m,
                                                              int balanced_bushings, double offset_ratio,
                                                              double arc_rad);
/**
 * The mesh as one plane slot across the face width (a stated estimate; clearance 0 seals it).
 * @param h the handle
 * @param clearance_m slot height, m (>= 0)
 * @param length_m sealing length of the slot, m (> 0 when the clearance is)
 * @return PUMPLOSS_OK or an error (the description is unchanged on error).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gear_pump_set_mesh(pumploss_gear_pump *h, double clearance_m, double length_m);
/**
 * The oil: two viscosity points (ASTM D341) and the density at 15 degC; other properties of a
 * typical mineral oil.
 * @param h the handle
 * @param t1_k first point temperature, K
 * @param nu1_m2_s first point kinematic viscosity, m^2/s
 * @param t2_k second point temperature, K
 * @param nu2_m2_s second point kinematic viscosity, m^2/s
 * @param rho15_kg_m3 density at 15 degC, kg/m^3
 * @return PUMPLOSS_OK or an error (the description is unchanged on error).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gear_pump_set_oil(pumploss_gear_pump *h, double t1_k, double nu1_m2_s,
                                                          double t2_k, double nu2_m2_s, double rho15_kg_m3);
/**
 * One path of the gear pump budget (PUMPLOSS_GEAR_PATH_*) and its clearance's sensitivity.
 * @param h the handle (oil set)
 * @param path PUMPLOSS_GEAR_PATH_*
 * @param outlet_pa outlet gauge pressure, Pa
 * @param inlet_pa inlet gauge pressure, Pa (<= outlet)
 * @param speed_rev_s shaft speed, rev/s
 * @param t_k oil temperature in the gaps, K
 * @param q_m3_s receives the path's leakage, m^3/s
 * @param total_m3_s receives the total leakage, m^3/s
 * @param volumetric_efficiency receives 1 - total / (V n)
 * @param d_total_d_gap_m2_s receives dQ_total/dh of the path's clearance, (m^3/s)/m
 * @param elasticity receives (h/Q) dQ_total/dh
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME (not laminar); PUMPLOSS_WIMPLAUSIBLE (leakage above the
 *         ideal flow); PUMPLOSS_EMISUSE when the oil is not set; PUMPLOSS_EDOMAIN for an unknown path.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_gear_pump_path(const pumploss_gear_pump *h, int path, double outlet_pa,
                                                       double inlet_pa, double speed_rev_s, double t_k,
                                                       double *q_m3_s, double *total_m3_s,
                                                       double *volumetric_efficiency, double *d_total_d_gap_m2_s,
                                                       double *elasticity);

/** Opaque vane pump description (clearances and oil). */
typedef struct pumploss_vane_pump pumploss_vane_pump;
/**
 * Create a vane pump description; side plates over half a turn, no slot path, oil unset.
 * @param displacement_m3_rev the maker's displacement, m^3/rev
 * @param hub_radius_m hub (shaft bore) radius, drained to the inlet, m
 * @param face_land_m rotor radius minus hub radius, m
 * @param ring_gap_m cam ring radius at the sealing arcs minus rotor radius, m
 * @param rotor_width_m rotor width, m
 * @param sealing_arcs arcs between an outlet and an inlet port (1 unbalanced, 2 balanced)
 * @param vanes_per_arc vanes in series in each arc (>= 1)
 * @param vane_tip_land_m sealing length across one vane tip, m
 * @param tip_clearance_m film between vane tip and cam ring, m
 * @param side_clearance_m film between a rotor face and its side plate, m
 * @param out receives the handle (NULL on error); free with pumploss_vane_pump_destroy()
 * @return PUMPLOSS_OK, PUMPLOSS_EDOMAIN, PUMPLOSS_ENONFINITE, PUMPLOSS_EMISUSE, PUMPLOSS_ENOMEM.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_vane_pump_create(double displacement_m3_rev, double hub_radius_m,
                                                         double face_land_m, double ring_gap_m, double rotor_width_m,
                                                         int sealing_arcs, int vanes_per_arc, double vane_tip_land_m,
                                                         double tip_clearance_m, double side_clearance_m,
                                                         pumploss_vane_pump **out);
/** Destroy a vane pump description; NULL is a no-op.
 *  @param h the handle */
PUMPLOSS_API void PUMPLOSS_CALL pumploss_vane_pump_destroy(pumploss_vane_pump *h);
/**
 * Arc of each rotor face under outlet pressure.
 * @param h the handle
 * @param pressure_arc_rad arc, rad, (0, 2 pi]
 * @return PUMPLOSS_OK or an error (the description is unchanged on error).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_vane_pump_set_sides(pumploss_vane_pump *h, double pressure_arc_rad);
/**
 * Vanes in their slots: those whose undervane space (at outlet pressure) faces a suction chamber.
 * @param h the handle
 * @param vanes_in_suction number of such vanes (>= 0; 0 removes the path)
 * @param slot_length_m engaged depth of a vane in its slot, m
 * @param slot_clearance_m clearance on the open side, m (>= 0; 0 removes the path)
 * @return PUMPLOSS_OK or an error (the description is unchanged on error).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_vane_pump_set_slots(pumploss_vane_pump *h, int vanes_in_suction,
                                                            double slot_length_m, double slot_clearance_m);
/**
 * The oil, as pumploss_gear_pump_set_oil().
 * @param h the handle
 * @param t1_k first point temperature, K
 * @param nu1_m2_s first point kinematic viscosity, m^2/s
 * @param t2_k second point temperature, K
 * @param nu2_m2_s second point kinematic viscosity, m^2/s
 * @param rho15_kg_m3 density at 15 degC, kg/m^3
 * @return PUMPLOSS_OK or an error (the description is unchanged on error).
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_vane_pump_set_oil(pumploss_vane_pump *h, double t1_k, double nu1_m2_s,
                                                          double t2_k, double nu2_m2_s, double rho15_kg_m3);
/**
 * One path of the vane pump budget (PUMPLOSS_VANE_PATH_*) and its clearance's sensitivity.
 * @param h the handle (oil set)
 * @param path PUMPLOSS_VANE_PATH_*
 * @param outlet_pa outlet gauge pressure, Pa
 * @param inlet_pa inlet gauge pressure, Pa (<= outlet)
 * @param speed_rev_s shaft speed, rev/s
 * @param t_k oil temperature in the gaps, K
 * @param q_m3_s receives the path's leakage, m^3/s
 * @param total_m3_s receives the total leakage, m^3/s
 * @param volumetric_efficiency receives 1 - total / (V n)
 * @param d_total_d_gap_m2_s receives dQ_total/dh of the path's clearance, (m^3/s)/m
 * @param elasticity receives (h/Q) dQ_total/dh
 * @return as pumploss_gear_pump_path().
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_vane_pump_path(const pumploss_vane_pump *h, int path, double outlet_pa,
                                                       double inlet_pa, double speed_rev_s, double t_k,
                                                       double *q_m3_s, double *total_m3_s,
                                                       double *volumetric_efficiency, double *d_total_d_gap_m2_s,
                                                       double *elasticity);
/** @} */

/** @name Hydraulic motors, pump inlet and shaft seal
 *  Motor case drain against inlet flow with bands (common practice, no source), creep at stall
 *  under a held load, the inlet pressure of a suction pipe at cold viscosity against the maker's
 *  minimum, and case pressure against the shaft seal's ratings. A held load needs a brake;
 *  a blocked case drain over-pressurises the case and blows the shaft seal. @{ */
#define PUMPLOSS_MOTOR_SOUND 0       /**< Motor drain band: at or below the sound limit. */
#define PUMPLOSS_MOTOR_ACCEPTABLE 1  /**< Motor drain band: at or below the acceptable limit. */
#define PUMPLOSS_MOTOR_ELEVATED 2    /**< Motor drain band: below the worn limit. */
#define PUMPLOSS_MOTOR_WORN 3        /**< Motor drain band: at or above the worn limit. */
/**
 * Motor case drain against its inlet flow.
 * @param drain_m3_s case drain flow, m^3/s (>= 0)
 * @param inlet_m3_s inlet flow, m^3/s (> 0)
 * @param sound_max largest sound fraction (0.05 common practice, no source)
 * @param acceptable_max largest acceptable fraction (0.10)
 * @param worn_min smallest worn fraction (0.15)
 * @param fraction receives drain / inlet
 * @param band receives PUMPLOSS_MOTOR_* (-1 on error)
 * @return PUMPLOSS_OK; PUMPLOSS_WIMPLAUSIBLE when the drain is not below the inlet flow; errors.
 *         @sa pumploss::motor_drain_check
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_motor_drain_check(double drain_m3_s, double inlet_m3_s, double sound_max,
                                                          double acceptable_max, double worn_min, double *fraction,
                                                          int *band);
/**
 * Creep of a motor holding a load with blocked ports (laminar leakage scaled from a stall test).
 * @param displacement_m3_rev motor displacement, m^3/rev
 * @param load_torque_nm held torque at the motor shaft, N m
 * @param hydromech_efficiency efficiency of the motor driven backwards by the load, (0, 1] (1 conservative)
 * @param leak_test_m3_s leakage measured at stall, m^3/s
 * @param leak_test_dp_pa pressure of that measurement, Pa
 * @param leak_test_mu_pa_s viscosity of that measurement, Pa s
 * @param mu_pa_s viscosity while holding, Pa s
 * @param travel_per_rev_m load travel per motor revolution, m (0: none)
 * @param holding_pressure_pa receives the port pressure of the held load, Pa
 * @param leakage_m3_s receives the leakage at that pressure, m^3/s
 * @param creep_speed_rev_s receives the creep speed, rev/s
 * @param load_speed_m_s receives the load's creep speed, m/s
 * @return PUMPLOSS_OK; PUMPLOSS_WEXTRAPOLATED above 1.25 times the test pressure; errors.
 *         @sa pumploss::motor_creep
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_motor_creep(double displacement_m3_rev, double load_torque_nm,
                                                    double hydromech_efficiency, double leak_test_m3_s,
                                                    double leak_test_dp_pa, double leak_test_mu_pa_s, double mu_pa_s,
                                                    double travel_per_rev_m, double *holding_pressure_pa,
                                                    double *leakage_m3_s, double *creep_speed_rev_s,
                                                    double *load_speed_m_s);
/**
 * Absolute pressure at a pump's inlet through one suction pipe with fittings of total loss
 * coefficient K at the pipe's bore (tank outlet included), at an oil temperature.
 * @param diameter_m pipe inside diameter, m
 * @param length_m pipe length, m
 * @param roughness_m pipe roughness, m (>= 0)
 * @param k_fittings sum of the fittings' loss coefficients, (>= 0)
 * @param height_m height of the pump's inlet above the oil level, m (negative: flooded)
 * @param q_m3_s suction flow, m^3/s
 * @param t_k oil temperature, K
 * @param t1_k oil's first viscosity point temperature, K
 * @param nu1_m2_s its kinematic viscosity, m^2/s
 * @param t2_k second point temperature, K
 * @param nu2_m2_s its kinematic viscosity, m^2/s
 * @param rho15_kg_m3 density at 15 degC, kg/m^3
 * @param p_tank_abs_pa absolute pressure over the oil, Pa (101325 vented)
 * @param p_min_abs_pa the maker's minimum absolute inlet pressure, Pa
 * @param inlet_abs_pa receives the absolute inlet pressure, Pa
 * @param margin_pa receives inlet pressure minus the minimum, Pa (>= 0 passes)
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME when k_fittings > 0 and the pipe's Reynolds number is
 *         below 1e4 (a constant K is a turbulent figure: a real fitting loses more in laminar
 *         flow, so the inlet pressure may be lower than computed); PUMPLOSS_EVALIDITY when the
 *         line cannot deliver the flow (the pressure would not be positive); errors.
 *         @sa pumploss::inlet_check
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_inlet_pipe_check(double diameter_m, double length_m, double roughness_m,
                                                         double k_fittings, double height_m, double q_m3_s,
                                                         double t_k, double t1_k, double nu1_m2_s, double t2_k,
                                                         double nu2_m2_s, double rho15_kg_m3, double p_tank_abs_pa,
                                                         double p_min_abs_pa, double *inlet_abs_pa,
                                                         double *margin_pa);
/**
 * Lowest oil temperature at which the inlet of pumploss_inlet_pipe_check() passes.
 * @param diameter_m pipe inside diameter, m
 * @param length_m pipe length, m
 * @param roughness_m pipe roughness, m
 * @param k_fittings sum of the fittings' loss coefficients
 * @param height_m height of the pump's inlet above the oil level, m
 * @param q_m3_s suction flow, m^3/s
 * @param t1_k oil's first viscosity point temperature, K
 * @param nu1_m2_s its kinematic viscosity, m^2/s
 * @param t2_k second point temperature, K
 * @param nu2_m2_s its kinematic viscosity, m^2/s
 * @param rho15_kg_m3 density at 15 degC, kg/m^3
 * @param p_tank_abs_pa absolute pressure over the oil, Pa
 * @param p_min_abs_pa the maker's minimum absolute inlet pressure, Pa
 * @param t_lo_k lower end of the search, K
 * @param t_hi_k upper end of the search, K
 * @param t_min_k receives the temperature, K
 * @return PUMPLOSS_OK; PUMPLOSS_WREGIME as pumploss_inlet_pipe_check() at the temperature found
 *         (with k_fittings > 0 the usual case for oil: the true start temperature may be somewhat
 *         higher); PUMPLOSS_EVALIDITY when it does not pass even at t_hi_k; errors.
 *         @sa pumploss::inlet_min_temperature
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_inlet_pipe_min_temperature(double diameter_m, double length_m,
                                                                   double roughness_m, double k_fittings,
                                                                   double height_m, double q_m3_s, double t1_k,
                                                                   double nu1_m2_s, double t2_k, double nu2_m2_s,
                                                                   double rho15_kg_m3, double p_tank_abs_pa,
                                                                   double p_min_abs_pa, double t_lo_k, double t_hi_k,
                                                                   double *t_min_k);
/**
 * Case pressure against the shaft seal's continuous and peak ratings (gauge).
 * @param case_continuous_pa continuous case pressure, Pa
 * @param case_peak_pa peak case pressure, Pa
 * @param seal_continuous_pa continuous rating, Pa (> 0)
 * @param seal_peak_pa peak rating, Pa (>= continuous rating)
 * @param margin_continuous_pa receives rating minus pressure, continuous, Pa (>= 0 passes)
 * @param margin_peak_pa receives rating minus pressure, peak, Pa (>= 0 passes)
 * @return PUMPLOSS_OK; PUMPLOSS_WIMPLAUSIBLE when the peak is below the continuous pressure;
 *         errors. @sa pumploss::shaft_seal_check
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_shaft_seal_check(double case_continuous_pa, double case_peak_pa,
                                                         double seal_continuous_pa, double seal_peak_pa,
                                                         double *margin_continuous_pa, double *margin_peak_pa);
/** @} */


#ifdef __cplusplus
}
#endif

#endif /* PUMPLOSS_H */
