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
 * - Codes 1-99 are errors: every non-NULL output is set to a quiet NaN, so a spreadsheet shows an
 *   error rather than a wrong number. Codes 100 and up are reports: the outputs are valid, but
 *   were computed outside a stated assumption (e.g. PUMPLOSS_WREGIME).
 * - A NULL output pointer is an error (PUMPLOSS_EMISUSE), never a crash.
 * - No global mutable state: every function is reentrant and safe to call from many threads.
 *   Scalar functions do not allocate. Handles (opaque pointers) are safe to use from several
 *   threads only for reading; destroying NULL is a no-op.
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
 *  0 is success; 1-99 are errors (outputs NaN); 100 and up are reports (outputs valid).
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
#define PUMPLOSS_WREGIME 100          /**< Valid, but outside the model's assumptions. */
#define PUMPLOSS_WTRANSITION 101      /**< Valid, in the laminar-turbulent transition region. */
#define PUMPLOSS_WILLCONDITIONED 102  /**< Valid, but the fit is ill-conditioned. */
#define PUMPLOSS_WEXTRAPOLATED 103    /**< Valid, extrapolated beyond data or table. */
#define PUMPLOSS_WPARTIAL 104         /**< Batch: some elements failed (see per-element status). */
#define PUMPLOSS_WIMPLAUSIBLE 105     /**< Valid, but physically implausible (e.g. efficiency > 1). */

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
 *         different quantities; PUMPLOSS_ENONFINITE for NaN/inf; PUMPLOSS_EMISUSE for NULL.
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
/* pumploss:capi-gap (declarations of this subject go above this line) */

/* ==== friction ==== */
/* pumploss:capi-friction (declarations of this subject go above this line) */

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
 * @return PUMPLOSS_OK; the first report code seen (e.g. PUMPLOSS_WIMPLAUSIBLE); PUMPLOSS_WPARTIAL
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
 * @return PUMPLOSS_OK, PUMPLOSS_WPARTIAL or PUMPLOSS_EMISUSE.
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
 * @param model receives the handle. It is set (non-NULL) whenever memory allows, also when the
 *        fit failed: pumploss_model_last_message() then says why and the getters return the
 *        fit's error. NULL on PUMPLOSS_ENOMEM or PUMPLOSS_EMISUSE.
 * @return PUMPLOSS_OK; PUMPLOSS_WILLCONDITIONED (coefficients uncertain); PUMPLOSS_EDATA;
 *         PUMPLOSS_EDOMAIN; PUMPLOSS_ENONFINITE; PUMPLOSS_EMISUSE (NULL array or bad kind);
 *         PUMPLOSS_ENOMEM. @sa pumploss::fit_loss_model
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
 * @param flow_residual_m3_s array of count, receives the flow residuals, m^3/s
 * @param torque_residual_n_m array of count, receives the torque residuals, N m
 * @return as pumploss_model_coefficients(); PUMPLOSS_EBUFFER when count is too small.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_residuals(const pumploss_model *model, size_t count,
                                                        double *flow_residual_m3_s, double *torque_residual_n_m);
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
 * @return PUMPLOSS_OK; the first report seen; PUMPLOSS_WPARTIAL; PUMPLOSS_EMISUSE.
 * @sa pumploss::loss_model_map
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_map(const pumploss_model *model, double mu_pa_s, size_t n_dp,
                                                  const double *dp_pa, size_t n_speed, const double *speed_rev_s,
                                                  double *eta_t, int *status);
/** @} */

/** @name Measurement uncertainty (GUM, JCGM 100:2008)
 *  State each instrument's uncertainty yourself: no accuracy-class presets are provided. @{ */
/**
 * Standard uncertainty of a reading from an instrument's stated figure.
 * @param figure the figure: absolute (SI) or per cent of reading (>= 0)
 * @param percent_of_reading 0: figure is absolute; 1: per cent of reading
 * @param distribution 0: figure is a standard uncertainty; 1: rectangular limits (u = a/sqrt(3));
 *        2: expanded with k = 2 (u = U/2)
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
/* pumploss:capi-efficiency (declarations of this subject go above this line) */

/* ==== pump ==== */
/* pumploss:capi-pump (declarations of this subject go above this line) */

/* ==== capi ==== */
/* pumploss:capi-capi (declarations of this subject go above this line) */

/* pumploss:capi-declarations (new subjects add their section above this line) */

#ifdef __cplusplus
}
#endif

#endif /* PUMPLOSS_H */
