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
/* pumploss:capi-efficiency (declarations of this subject go above this line) */

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
 * @param pressure_exponent a (>= 0)
 * @param viscosity_exponent b (>= 0)
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
 * @param growth receives the growth over the baseline (0.3 = +30 %); NaN when no baseline is set
 *        (reason PUMPLOSS_REASON_NO_BASELINE)
 * @return PUMPLOSS_OK, PUMPLOSS_WIMPLAUSIBLE (fraction above 1), PUMPLOSS_EDOMAIN,
 *         PUMPLOSS_ENONFINITE (NaN/inf in a required input, inf in a temperature), PUMPLOSS_EMISUSE.
 */
PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_assess(const pumploss_health *h, double drain_flow_m3_s,
                                                      double outlet_pa, double case_pa, double oil_t_k,
                                                      double speed_rev_s, double drain_t_k, double inlet_t_k,
                                                      int *level, int *reasons, double *fraction,
                                                      double *fraction_at_reference, double *growth);
/** A sentence for one reason bit.
 *  @param reason one PUMPLOSS_REASON_* bit
 *  @return the sentence (static storage, never NULL); a sentence saying so for an unknown bit */
PUMPLOSS_API const char *PUMPLOSS_CALL pumploss_health_reason_text(int reason);
/** The name of a level.
 *  @param level a PUMPLOSS_HEALTH_* value
 *  @return "sound", "acceptable", "elevated", "worn", or "unknown" (static storage) */
PUMPLOSS_API const char *PUMPLOSS_CALL pumploss_health_level_name(int level);
/** @} */
/* pumploss:capi-pump (declarations of this subject go above this line) */

/* ==== capi ==== */
/* pumploss:capi-capi (declarations of this subject go above this line) */

/* pumploss:capi-declarations (new subjects add their section above this line) */

#ifdef __cplusplus
}
#endif

#endif /* PUMPLOSS_H */
