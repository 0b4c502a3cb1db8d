/*
 * tubeheat.h - tube-side convective heat transfer, the public C API.
 *
 * This header is the reference for the library. Every function:
 *   - returns a status code (th_status, below) and writes its results
 *     through pointer arguments; nothing is returned any other way;
 *   - writes its outputs when the status is TH_OK or TH_WARN_RANGE, and
 *     leaves them untouched on any error (the two *_array functions, which
 *     give every row its own status, say how they differ);
 *   - never writes NaN or infinity together with TH_OK or TH_WARN_RANGE;
 *   - takes and returns SI units (m, kg, s, K, Pa, W, J) as stated beside
 *     each argument; temperatures are absolute (kelvin);
 *   - is thread-safe and reentrant: the library keeps no mutable global
 *     state (read-only tables and function-local caches guarded by the
 *     C++ memory model only), and no C++ exception or type crosses this
 *     interface.
 *
 * Conventions used throughout
 *   D        inside diameter of a circular tube, or hydraulic diameter
 *            D_h = 4 A / P of a duct                                   [m]
 *   Re       Reynolds number based on D and the mean velocity
 *   Pr       Prandtl number at the bulk (mixing-cup) temperature
 *   x* = x / (D Re Pr)   inverse Graetz number (the abscissa of most
 *            laminar entry-region charts); Gz = 1/x* = (D/x) Re Pr
 *   f        Darcy (Moody) friction factor, four times the Fanning one
 *   "T"      uniform wall temperature;  "H" uniform wall heat flux
 *
 * Results size equipment that can scald, burst or freeze. Correlations
 * scatter by +-10 to +-25 % against data; apply margins, follow local
 * codes, and have designs reviewed by a qualified, licensed engineer.
 */
#ifndef TUBEHEAT_H
#define TUBEHEAT_H

#include <stddef.h>

#ifdef __cplusplus
extern "C" {
#endif

#if defined(TH_BUILDING_LIBRARY)
#define TH_API __attribute__((visibility("default")))
#else
#define TH_API
#endif

/* ------------------------------------------------------------------------
 * Version
 * --------------------------------------------------------------------- */
#define TH_VERSION_MAJOR 0
#define TH_VERSION_MINOR 4
#define TH_VERSION_PATCH 0
#define TH_VERSION_STRING "0.4.0"
/* Packed as major*10000 + minor*100 + patch. */
#define TH_VERSION_NUMBER \
    (TH_VERSION_MAJOR * 10000 + TH_VERSION_MINOR * 100 + TH_VERSION_PATCH)

/* The version of the library actually loaded, packed like
 * TH_VERSION_NUMBER; compare with the macro to detect a header/library
 * mismatch. */
TH_API int th_version(void);
/* The same as a static string, "major.minor.patch". */
TH_API const char *th_version_string(void);

/* ------------------------------------------------------------------------
 * Status codes
 *
 * 0 is success, 1 is the only warning (a value was written), codes >= 10
 * are errors (nothing was written). Use TH_FAILED(s) to test.
 * --------------------------------------------------------------------- */
typedef enum th_status {
    TH_OK = 0,
    /* Computed, but at least one input lies outside the method's published
     * validity range (or the method was applied outside its regime). The
     * value is written; treat it as an extrapolation. */
    TH_WARN_RANGE = 1,
    /* Bad input: NULL output pointer, NaN/infinite argument, zero or
     * negative where physically meaningless, inconsistent arguments
     * (e.g. inner diameter >= outer diameter), unknown option flag, or
     * finite arguments so extreme that the result would overflow. */
    TH_ERR_INPUT = 10,
    /* Unknown method identifier or method name. */
    TH_ERR_METHOD = 11,
    /* An iteration or root search did not converge to its tolerance. */
    TH_ERR_NO_CONVERGENCE = 12,
    /* The requested target cannot be reached (e.g. an outlet temperature
     * beyond the wall temperature, or no length gives it). */
    TH_ERR_UNREACHABLE = 13,
    /* The state lies outside the formulation that describes the fluid
     * (e.g. water that would be vapour at this pressure, or a temperature
     * outside the property formulation's range). */
    TH_ERR_STATE = 14,
    /* The computation failed for a reason not covered above (an internal
     * numerical failure, memory exhaustion). Please report it. */
    TH_ERR_INTERNAL = 15
} th_status;

#define TH_FAILED(s) ((s) >= 10)

/* Static English text for a status code; never NULL (unknown codes get a
 * text saying so). */
TH_API const char *th_status_message(int status);

/* ------------------------------------------------------------------------
 * Dimensionless groups and geometry            (lib/src/groups.cpp)
 * --------------------------------------------------------------------- */

/* Re = rho u D / mu.  rho [kg/m3] > 0, u [m/s] >= 0, d [m] > 0,
 * mu [Pa s] > 0. */
TH_API int th_reynolds(double rho, double u, double d, double mu, double *re);
/* Re = 4 mdot / (pi D mu) for a circular tube.  mdot [kg/s] >= 0. */
TH_API int th_reynolds_mass_flow(double mdot, double d, double mu, double *re);
/* Re = mdot D_h / (A mu) for any cross-section: d_h [m] hydraulic
 * diameter, area [m2] flow cross-section. */
TH_API int th_reynolds_mass_flow_duct(double mdot, double d_h, double area,
                                      double mu, double *re);
/* Pr = cp mu / k.  cp [J/(kg K)], mu [Pa s], k [W/(m K)], all > 0. */
TH_API int th_prandtl(double cp, double mu, double k, double *pr);
/* Pe = Re Pr. */
TH_API int th_peclet(double re, double pr, double *pe);

/* Graetz number conventions. The library's own convention everywhere is
 * TH_GRAETZ_DIAMETER. */
typedef enum th_graetz_convention {
    TH_GRAETZ_DIAMETER = 0,  /* Gz = (D/x) Re Pr = 1/x*                  */
    TH_GRAETZ_MASS_FLOW = 1  /* Gz = mdot cp/(k x) = (pi/4)(D/x) Re Pr   */
} th_graetz_convention;

/* Graetz number at distance x [m] > 0 from the start of heating. */
TH_API int th_graetz(double re, double pr, double d, double x,
                     int convention, double *gz);
/* Inverse Graetz number x* = x / (D Re Pr) (always TH_GRAETZ_DIAMETER). */
TH_API int th_inverse_graetz(double x, double d, double re, double pr,
                             double *x_star);

/* Hydraulic diameter D_h = 4 A / P from flow area [m2] and wetted
 * perimeter [m]. */
TH_API int th_hydraulic_diameter(double area, double perimeter, double *d_h);
/* Rectangle of sides a, b [m]: D_h = 2ab/(a+b). */
TH_API int th_hydraulic_diameter_rectangle(double a, double b, double *d_h);
/* Concentric annulus between an inner tube of outside diameter d_inner
 * and a shell of inside diameter d_outer [m]: D_h = d_outer - d_inner. */
TH_API int th_hydraulic_diameter_annulus(double d_inner, double d_outer,
                                         double *d_h);

/* h = Nu k / D  [W/(m2 K)]  and  Nu = h D / k. */
TH_API int th_h_from_nusselt(double nu, double k, double d, double *h);
TH_API int th_nusselt_from_h(double h, double d, double k, double *nu);

/* ------------------------------------------------------------------------
 * Regime and entry region                     (lib/src/regime_entry.cpp)
 * --------------------------------------------------------------------- */

/* Flow regime from Re with the thresholds of common practice for tubes:
 * laminar Re < 2300, transitional 2300 <= Re < 10000, turbulent
 * Re >= 10000. At the thresholds the higher regime applies. */
#define TH_RE_LAMINAR_MAX 2300.0
#define TH_RE_TURBULENT_MIN 10000.0
typedef enum th_regime {
    TH_LAMINAR = 0,
    TH_TRANSITIONAL = 1,
    TH_TURBULENT = 2
} th_regime;
TH_API int th_regime_of(double re, int *regime);
/* "laminar", "transitional", "turbulent"; NULL for an unknown value. */
TH_API const char *th_regime_name(int regime);

/* Entry-length methods. Each gives x_fd/D, the distance from the start of
 * the tube (hydrodynamic) or of heating (thermal), in diameters, beyond
 * which the flow counts as fully developed. */
typedef enum th_entry_method {
    TH_ENTRY_AUTO = 0,          /* laminar: SHAH_LONDON; else TURBULENT_10D */
    TH_ENTRY_COMMON = 1,        /* laminar 0.05 Re (hydro), 0.05 Re Pr
                                   (thermal)              (common practice) */
    TH_ENTRY_SHAH_LONDON = 2,   /* laminar: hydro 0.0565 Re; thermal
                                   0.0335 Re Pr (T), 0.0430 Re Pr (H)
                                   (Shah & London 1978)                    */
    TH_ENTRY_DURST = 3,         /* laminar hydro only:
                                   [0.619^1.6 + (0.0567 Re)^1.6]^(1/1.6)
                                   (Durst et al. 2005), valid at low Re    */
    TH_ENTRY_TURBULENT_10D = 4, /* turbulent: 10 D (common practice)      */
    TH_ENTRY_TURBULENT_60D = 5  /* turbulent, conservative: 60 D
                                   (common practice)                       */
} th_entry_method;

/* Wall thermal boundary condition. */
typedef enum th_wall_condition {
    TH_WALL_T = 0,  /* uniform wall temperature */
    TH_WALL_H = 1   /* uniform wall heat flux   */
} th_wall_condition;

/* Hydrodynamic entry length x_fd,h / D. */
TH_API int th_entry_length_hydro(int method, double re, double *x_over_d);
/* Thermal entry length x_fd,t / D for the given wall condition. */
TH_API int th_entry_length_thermal(int method, double re, double pr, int wall,
                                   double *x_over_d);

/* Entry state at x/D (x measured from the tube inlet for the velocity and
 * from the start of heating for the temperature; the same point when the
 * heated section starts at the inlet). */
typedef struct th_entry_info {
    int regime;             /* th_regime                                  */
    int hydro_developed;    /* 1 if x >= x_fd,h                           */
    int thermal_developed;  /* 1 if x >= x_fd,t                           */
    double x_fd_hydro_over_d;
    double x_fd_thermal_over_d;
    double x_star;          /* x / (D Re Pr)                              */
} th_entry_info;
TH_API int th_entry_state(int method, double re, double pr, double x_over_d,
                          int wall, th_entry_info *info);

/* ------------------------------------------------------------------------
 * Friction factor (Darcy) and pressure drop     (lib/src/friction.cpp)
 * --------------------------------------------------------------------- */
typedef enum th_friction_method {
    TH_F_AUTO = 0,        /* laminar below Re 2300, Colebrook above;
                             transitional values carry TH_WARN_RANGE     */
    TH_F_LAMINAR = 1,     /* 64/Re, Re < 2300 (analytic, Hagen-Poiseuille) */
    TH_F_COLEBROOK = 2,   /* Colebrook (1939), solved exactly through the
                             Lambert W function; 4000 <= Re <= 1e8,
                             0 <= eps/D <= 0.05                          */
    TH_F_HAALAND = 3,     /* Haaland (1983); 4000 <= Re <= 1e8,
                             1e-6 <= eps/D <= 0.05 (or smooth)           */
    TH_F_SWAMEE_JAIN = 4, /* Swamee & Jain (1976); 5000 <= Re <= 1e8,
                             1e-6 <= eps/D <= 0.01 (or smooth)           */
    TH_F_CHURCHILL = 5,   /* Churchill (1977), all regimes; 0 < Re,
                             0 <= eps/D <= 0.05                          */
    TH_F_PETUKHOV = 6,    /* Petukhov (1970) smooth tubes
                             (0.790 ln Re - 1.64)^-2; 3000 <= Re <= 5e6,
                             eps/D = 0                                   */
    TH_F_METHOD_COUNT = 7
} th_friction_method;

/* Darcy friction factor for Re > 0 and relative roughness eps/D >= 0
 * (eps/D < 1). Fully developed flow. */
TH_API int th_friction_factor(int method, double re, double rel_roughness,
                              double *f);
/* Darcy-Weisbach pressure drop dp = f (L/D) rho u^2 / 2 [Pa]; f > 0,
 * length [m] >= 0, d [m] > 0, rho [kg/m3] > 0, u [m/s] >= 0. */
TH_API int th_pressure_drop(double f, double length, double d, double rho,
                            double u, double *dp);
/* Pressure drop of a circular tube from mass flow: Re from mdot, f by the
 * method, dp = f (L/D) rho u^2/2 with u = 4 mdot/(rho pi D^2). Outputs f
 * (may be NULL) and dp. */
TH_API int th_pressure_drop_mass_flow(int method, double mdot, double d,
                                      double length, double rel_roughness,
                                      double rho, double mu, double *f,
                                      double *dp);

/* Case-insensitive lookup of a friction method by its published name
 * ("Colebrook", "Haaland", "Swamee-Jain", "Churchill", "Petukhov",
 * "laminar", "auto"; '-', '_' and ' ' are interchangeable). */
TH_API int th_friction_method_from_name(const char *name, int *method);
/* Display name of a method; NULL for an unknown id. */
TH_API const char *th_friction_method_name(int method);

/* Friction factors for n Reynolds numbers re[i] in one pipe (one
 * rel_roughness): f[i] and status[i] exactly as th_friction_factor(method,
 * re[i], rel_roughness, ...) gives them, for a fraction of the per-call
 * cost (the method and the roughness are checked once). For bulk work:
 * tables, marching along a tube, spreadsheet ranges.
 *   - A bad call (unknown method: TH_ERR_METHOD; NULL array with n > 0:
 *     TH_ERR_INPUT) writes nothing.
 *   - Otherwise every row is written: a failed row gets its error code in
 *     status[i] and f[i] = NaN, so that it cannot pass for a number. The
 *     return value is the code of the first failed row, else TH_WARN_RANGE
 *     when any row warned, else TH_OK.
 *   - f may be the same array as re (computed in place). */
TH_API int th_friction_factor_array(int method, size_t n, const double *re,
                                    double rel_roughness, double *f,
                                    int *status);

/* ------------------------------------------------------------------------
 * Nusselt number by chosen method     (laminar.hpp, turbulent.hpp,
 *                                      nusselt.cpp)
 * --------------------------------------------------------------------- */
typedef enum th_nusselt_method {
    TH_NU_AUTO = 0,                 /* chosen from regime, entry, Pr, wall */
    TH_NU_LAMINAR_DEVELOPED = 1,    /* 3.657 (T) / 48/11 (H), circle; ducts
                                       from the duct table                  */
    TH_NU_DITTUS_BOELTER = 2,       /* 0.023 Re^0.8 Pr^n, n 0.4 heating,
                                       0.3 cooling                         */
    TH_NU_SIEDER_TATE = 3,          /* 0.027 Re^0.8 Pr^(1/3)(mu/mu_s)^0.14 */
    TH_NU_PETUKHOV = 4,             /* Petukhov (1970)                     */
    TH_NU_GNIELINSKI = 5,           /* Gnielinski (1976), options below    */
    TH_NU_GNIELINSKI_TRANSITION = 6,/* Gnielinski (2013) interpolation
                                       2300 < Re < 1e4                      */
    TH_NU_HAUSEN = 7,               /* Hausen (1943) mean, T, thermal entry*/
    TH_NU_SIEDER_TATE_LAMINAR = 8,  /* 1.86 (Re Pr D/L)^(1/3)(mu/mu_s)^0.14
                                       mean, T, combined entry             */
    TH_NU_SHAH = 9,                 /* Shah (1975) fits of the exact
                                       thermal-entry solution, local/mean,
                                       T/H                                  */
    TH_NU_GNIELINSKI_LAMINAR = 10,  /* VDI composite, mean, T/H, combined
                                       (or thermal) entry                   */
    TH_NU_LIQUID_METAL = 11,        /* Skupinski (H) / Seban-Shimazaki (T) */
    TH_NU_GRAETZ_EXACT = 12,        /* exact thermal-entry series (Graetz,
                                       Siegel-Sparrow-Hallman), local/mean  */
    TH_NU_COMBINED_ENTRY_NUMERIC = 13, /* boundary-layer marching solution,
                                       velocity and temperature developing  */
    TH_NU_METHOD_COUNT = 14
} th_nusselt_method;

typedef enum th_averaging {
    TH_MEAN = 0,   /* mean over 0..L (l_over_d is L/D) */
    TH_LOCAL = 1   /* local at x (l_over_d is x/D)     */
} th_averaging;

typedef enum th_heat_direction {
    TH_HEATING = 0,  /* the fluid is heated (wall hotter than bulk) */
    TH_COOLING = 1   /* the fluid is cooled                          */
} th_heat_direction;

typedef enum th_entry_kind {
    /* Velocity fully developed where heating starts (unheated starting
     * length, or Pr >> 1): thermal entry problem. */
    TH_ENTRY_THERMAL = 0,
    /* Velocity and temperature develop together from a uniform inlet. */
    TH_ENTRY_COMBINED = 1
} th_entry_kind;

/* Property-variation correction applied by TH_NU_GNIELINSKI. */
typedef enum th_property_correction {
    TH_CORR_NONE = 0,
    TH_CORR_LIQUID = 1,  /* K = (Pr/Pr_w)^0.11, needs pr_wall            */
    TH_CORR_GAS = 2      /* K = (T_b/T_w)^0.45 when heated, 1 when cooled;
                            needs t_ratio = T_b/T_w                       */
} th_property_correction;

/* Duct shapes for laminar fully developed values (TH_NU_LAMINAR_DEVELOPED
 * and the automatic choice). Turbulent correlations use D_h. */
typedef enum th_duct_shape {
    TH_DUCT_CIRCLE = 0,
    TH_DUCT_RECTANGLE = 1,        /* duct_ratio = short side / long side,
                                     0 < ratio <= 1                        */
    TH_DUCT_PARALLEL_PLATES = 2,  /* both plates heated                    */
    TH_DUCT_ANNULUS = 3           /* duct_ratio = d_inner/d_outer, inner wall
                                     heated, outer insulated               */
} th_duct_shape;

/* Everything a Nusselt method may need. Initialise with
 * th_conditions_init() and set what applies; each method reads only the
 * fields it uses, checks only those, and ignores the rest (an unused field
 * may hold anything). Every method reads re, pr and l_over_d; beyond them:
 *
 *   TH_NU_AUTO                    averaging, wall, entry, duct, and then
 *                                 what the chosen method reads
 *   TH_NU_LAMINAR_DEVELOPED       wall, duct, duct_ratio
 *   TH_NU_DITTUS_BOELTER          direction
 *   TH_NU_SIEDER_TATE             mu_ratio
 *   TH_NU_PETUKHOV                rel_roughness
 *   TH_NU_GNIELINSKI              averaging, rel_roughness, correction
 *                                 (with pr_wall or t_ratio), length_factor
 *   TH_NU_GNIELINSKI_TRANSITION   as TH_NU_GNIELINSKI, and wall, entry
 *   TH_NU_SIEDER_TATE_LAMINAR     averaging, wall, entry, duct, mu_ratio
 *   TH_NU_HAUSEN, TH_NU_SHAH, TH_NU_GNIELINSKI_LAMINAR, TH_NU_GRAETZ_EXACT,
 *   TH_NU_COMBINED_ENTRY_NUMERIC  averaging, wall, entry, duct
 *   TH_NU_LIQUID_METAL            wall
 *
 * (duct_ratio only for the shapes that use it; the circular-tube laminar
 * methods read duct only to warn when it is not a circle.) */
typedef struct th_conditions {
    double re;            /* Reynolds number, > 0                          */
    double pr;            /* bulk Prandtl number, > 0                      */
    double l_over_d;      /* L/D (TH_MEAN) or x/D (TH_LOCAL), > 0;
                             INFINITY = fully developed (default)          */
    int averaging;        /* th_averaging, default TH_MEAN                 */
    int wall;             /* th_wall_condition, default TH_WALL_T          */
    int direction;        /* th_heat_direction, default TH_HEATING         */
    int entry;            /* th_entry_kind, default TH_ENTRY_COMBINED      */
    double mu_ratio;      /* mu_bulk / mu_wall, > 0, default 1             */
    double rel_roughness; /* eps/D >= 0, default 0 (smooth)                */
    int correction;       /* th_property_correction, default TH_CORR_NONE  */
    double pr_wall;       /* Pr at the wall temperature, > 0; required with
                             TH_CORR_LIQUID (init leaves 0 = not given)    */
    double t_ratio;       /* T_bulk/T_wall in kelvin (TH_CORR_GAS), def. 1 */
    int length_factor;    /* 1: Gnielinski mean over L multiplies by
                             1 + (D/L)^(2/3) when L is finite (default 1)  */
    int duct;             /* th_duct_shape, default TH_DUCT_CIRCLE         */
    double duct_ratio;    /* see th_duct_shape, default 1                  */
} th_conditions;

/* Fill *c with the defaults stated above (re and pr are set to 0 and must
 * be given). */
TH_API int th_conditions_init(th_conditions *c);

typedef struct th_nusselt_result {
    double nu;               /* Nusselt number based on D                  */
    int method;              /* th_nusselt_method actually used            */
    const char *method_name; /* static display name of that method         */
    const char *reason;      /* static text: why this method (TH_NU_AUTO)
                                or "chosen by caller"                      */
    const char *range_note;  /* static text naming the first validity limit
                                exceeded, "" when within range             */
    double f;                /* Darcy friction factor the method used, or 0
                                when it uses none                          */
} th_nusselt_result;

/* Nusselt number by method. TH_WARN_RANGE when a condition lies outside
 * the method's published range (range_note says which). */
TH_API int th_nusselt(int method, const th_conditions *c,
                      th_nusselt_result *out);

/* Case-insensitive lookup by published name ("Dittus-Boelter",
 * "Sieder-Tate", "Gnielinski", "Petukhov", "Hausen", "Shah", ...; see the
 * function reference for the full list and aliases). */
TH_API int th_nusselt_method_from_name(const char *name, int *method);
/* Display name; NULL for an unknown id. */
TH_API const char *th_nusselt_method_name(int method);

/* Nusselt numbers for n rows that share every condition in *shared except
 * re[i], pr[i] and, when l_over_d is not NULL, l_over_d[i] (otherwise
 * shared->l_over_d for every row; shared->re and ->pr are not read).
 * nu[i] and status[i] are exactly what th_nusselt(method, &row_i, ...)
 * gives, for a fraction of its per-call cost: the shared fields are
 * checked once and the method is dispatched once (TH_NU_AUTO still
 * chooses row by row, at th_nusselt's cost). The name, reason, range note
 * and friction factor of each row are not returned: call th_nusselt for a
 * row whose status[i] is TH_WARN_RANGE to read its note.
 *   - A bad call (unknown method: TH_ERR_METHOD; NULL shared or array with
 *     n > 0: TH_ERR_INPUT) writes nothing.
 *   - Otherwise every row is written: a failed row gets its error code in
 *     status[i] and nu[i] = NaN, so that it cannot pass for a number. The
 *     return value is the code of the first failed row, else TH_WARN_RANGE
 *     when any row warned, else TH_OK.
 *   - nu may be the same array as re, pr or l_over_d (computed in place). */
TH_API int th_nusselt_array(int method, const th_conditions *shared, size_t n,
                            const double *re, const double *pr,
                            const double *l_over_d, double *nu, int *status);

/* ------------------------------------------------------------------------
 * Tube energy balance                          (lib/src/energy.cpp)
 * --------------------------------------------------------------------- */

/* Heat rate into the fluid q = mdot cp (t_out - t_in) [W]; negative when
 * the fluid is cooled. */
TH_API int th_heat_rate(double mdot, double cp, double t_in, double t_out,
                        double *q);

/* Log-mean temperature difference of two end differences [K]; both must
 * have the same sign and be non-zero; equal ends give the arithmetic
 * limit. */
TH_API int th_lmtd(double dt_in, double dt_out, double *lmtd);

/* Outlet bulk temperature with a uniform surrounding temperature t_s [K]
 * (the wall itself, or an outside fluid) reached through a total
 * conductance UA [W/K] >= 0:
 *     (t_s - t_out)/(t_s - t_in) = exp(-UA/(mdot cp)).
 * For a uniform wall temperature UA = h_mean * perimeter * length. */
TH_API int th_outlet_temperature_ua(double t_in, double t_s, double ua,
                                    double mdot, double cp, double *t_out);

/* Uniform wall heat flux q_flux [W/m2] (positive into the fluid) over a
 * perimeter [m] and length [m]: t_out = t_in + q_flux P L/(mdot cp), and
 * the wall temperature at the outlet t_out + q_flux / h_out where h_out
 * [W/(m2 K)] > 0 is the local coefficient there. t_wall_out may be NULL. */
TH_API int th_outlet_temperature_flux(double t_in, double q_flux,
                                      double perimeter, double length,
                                      double mdot, double cp, double h_out,
                                      double *t_out, double *t_wall_out);

/* Overall conductance UA [W/K] of a circular tube of length L [m] between
 * the inside fluid and an outside fluid, through inside convection h_i,
 * inside fouling rf_i [m2 K/W], a wall of conductivity k_wall [W/(m K)]
 * from d_i to d_o, outside fouling rf_o and outside convection h_o:
 *   1/UA = 1/(h_i A_i) + rf_i/A_i + ln(d_o/d_i)/(2 pi k_wall L)
 *          + rf_o/A_o + 1/(h_o A_o),   A_i = pi d_i L, A_o = pi d_o L.
 * h_o = INFINITY means the outer surface is held at the outside
 * temperature; fouling 0 means clean. */
TH_API int th_ua_tube(double h_i, double d_i, double d_o, double k_wall,
                      double h_o, double rf_i, double rf_o, double length,
                      double *ua);

/* Length [m] for a target outlet temperature with a uniform surrounding
 * temperature t_s and a conductance per unit length ua_per_length
 * [W/(m K)] (h P for a bare wall):
 *     L = mdot cp / ua_per_length * ln((t_s - t_in)/(t_s - t_target)).
 * TH_ERR_UNREACHABLE when the target is not strictly between t_in and
 * t_s. */
TH_API int th_length_for_outlet_ua(double t_in, double t_target, double t_s,
                                   double ua_per_length, double mdot,
                                   double cp, double *length);

/* Length [m] for a target outlet temperature under uniform flux:
 * L = mdot cp (t_target - t_in)/(q_flux P). TH_ERR_UNREACHABLE when the
 * flux heats and the target is below the inlet, or the reverse. */
TH_API int th_length_for_outlet_flux(double t_in, double t_target,
                                     double q_flux, double perimeter,
                                     double mdot, double cp, double *length);

/* ======================================================================
 * Sections below are added by later work (properties, laminar entry
 * region and ducts, whole-tube solve). Keep the conventions above.
 * ==================================================================== */

/* @@SECTION properties@@ */
/* ------------------------------------------------------------------------
 * Fluid properties: liquid water and dry air
 *                        (lib/src/properties_water_if97.cpp,
 *                         properties_water_transport.cpp, properties_air.cpp)
 *
 * A convenience only: every heat-transfer function above takes its
 * properties as plain arguments, so oils, glycols, refrigerants and any
 * other fluid work with the caller's own data. Evaluate properties at the
 * bulk (mixing-cup) temperature unless a method says otherwise.
 *
 * Arguments: t [K] > 0, p [Pa] > 0 absolute; NaN, infinity, zero or
 * negative values give TH_ERR_INPUT. Every function is a pure function of
 * its arguments (no state, thread-safe).
 *
 * Liquid water: IAPWS-IF97 region 1 (IAPWS R7-97, 2012 revision) for rho,
 * cp and h; viscosity IAPWS R12-08 without the critical enhancement (its
 * industrial form); thermal conductivity IAPWS R15-11 in its industrial
 * form (with the critical enhancement evaluated from IF97). Valid for
 *     273.15 K <= t <= 623.15 K  and  p_sat(t) <= p <= 100 MPa.
 * Outside that, or at p < p_sat(t) (the water would be vapour):
 * TH_ERR_STATE. Viscosity, conductivity, Prandtl number and th_water_props
 * return TH_WARN_RANGE for 273.15 K <= t < 273.16 K, where the transport
 * releases (which start at the triple point) are extrapolated by 0.01 K.
 * The code reproduces every verification value printed in these releases
 * for this range; the uncertainty of the formulations themselves (a few
 * tenths of a percent to a few percent) is in docs/properties.md.
 *
 * Dry air: ideal gas (rho = p/(R t), R = 287.117 J/(kg K)) with the ideal-
 * gas cp and h of Lemmon et al. (2000) and the dilute-gas viscosity and
 * conductivity of Lemmon & Jacobsen (2004). The density-dependent terms are
 * left out, so these are values "near atmospheric pressure":
 *     in range (TH_OK):          200 K <= t <= 2000 K and p <= 0.2 MPa
 *                                (within 1 % of the full formulations);
 *     extrapolated (TH_WARN_RANGE): 150 K <= t < 200 K, 2000 K < t <=
 *                                3000 K, or 0.2 MPa < p <= 1 MPa (cp up
 *                                to about 10 % off at 150 K and 1 MPa);
 *     TH_ERR_STATE:              t < 150 K, t > 3000 K, p > 1 MPa, or
 *                                p < 1 Pa (rarefied: not a continuum).
 * ---------------------------------------------------------------------- */

/* A property set at one state. */
typedef struct th_fluid_props {
    double rho; /* density                                   [kg/m3]     */
    double cp;  /* specific isobaric heat capacity           [J/(kg K)]  */
    double mu;  /* dynamic viscosity                         [Pa s]      */
    double k;   /* thermal conductivity                      [W/(m K)]   */
    double pr;  /* Prandtl number cp mu / k                  [-]         */
    double h;   /* specific enthalpy                         [J/kg]; water:
                   IF97 zero (u = 0, s = 0 for the liquid at the triple
                   point); air: 0 at 273.15 K. Use differences only.    */
    const char *range_note; /* static text naming the first validity limit
                   exceeded when TH_WARN_RANGE, "" otherwise             */
} th_fluid_props;

/* Liquid water at t [K], p [Pa]: every field of *out. */
TH_API int th_water_props(double t, double p, th_fluid_props *out);
/* Single properties of liquid water at t [K], p [Pa] (same validity and
 * codes as th_water_props; density, cp and enthalpy never warn). */
TH_API int th_water_density(double t, double p, double *rho);    /* kg/m3 */
TH_API int th_water_cp(double t, double p, double *cp);       /* J/(kg K) */
TH_API int th_water_enthalpy(double t, double p, double *h);      /* J/kg */
TH_API int th_water_viscosity(double t, double p, double *mu);    /* Pa s */
TH_API int th_water_conductivity(double t, double p,
                                 double *k);                   /* W/(m K) */
TH_API int th_water_prandtl(double t, double p, double *pr);         /* - */

/* Saturation pressure p [Pa] of water at t [K], IF97 region 4;
 * 273.15 K <= t <= 647.096 K (the critical point), else TH_ERR_STATE. */
TH_API int th_water_saturation_pressure(double t, double *p);
/* Saturation temperature t [K] of water at p [Pa], IF97 region 4;
 * 611.213 Pa <= p <= 22.064 MPa, else TH_ERR_STATE. */
TH_API int th_water_saturation_temperature(double p, double *t);

/* Dry air at t [K], p [Pa]: every field of *out. */
TH_API int th_air_props(double t, double p, th_fluid_props *out);
/* Single properties of dry air at t [K], p [Pa]. cp, h, mu and k of an
 * ideal, dilute gas do not depend on p; p is still checked against the
 * range above so that every air function answers the same way. */
TH_API int th_air_density(double t, double p, double *rho);      /* kg/m3 */
TH_API int th_air_cp(double t, double p, double *cp);         /* J/(kg K) */
TH_API int th_air_enthalpy(double t, double p, double *h);        /* J/kg */
TH_API int th_air_viscosity(double t, double p, double *mu);      /* Pa s */
TH_API int th_air_conductivity(double t, double p, double *k); /* W/(m K) */
TH_API int th_air_prandtl(double t, double p, double *pr);           /* - */

/* @@SECTION entry-region@@ */
/* ------------------------------------------------------------------------
 * Laminar entry region, computed exactly, and laminar ducts
 *       (lib/src/laminar_entry_series.cpp, laminar_entry_march.cpp,
 *        laminar_entry_api.cpp, ducts.cpp; method notes in
 *        docs/laminar-entry.md)
 *
 * Two different entry problems; each function names the one it solves:
 *   THERMAL ENTRY   the velocity profile is already fully developed
 *                   (parabolic) where heating starts: a tube with an
 *                   unheated starting length, or very viscous fluids
 *                   (Pr >~ 100, where the flow develops long before the
 *                   temperature). Exact series solution.
 *   COMBINED ENTRY  velocity and temperature are both uniform at the tube
 *                   inlet and develop together (gases, water). Numerical
 *                   (boundary-layer) solution for the given Pr.
 * Circular tube, laminar, constant properties, no axial conduction (fails
 * for Pe = Re Pr below ~100) and no natural convection.
 *   x* = x / (D Re Pr) measured from the start of heating (> 0; INFINITY
 *        means fully developed); x+ = x / (D Re) from the tube inlet.
 *   Nusselt numbers are based on D. wall is th_wall_condition; averaging
 *   is th_averaging:
 *     TH_LOCAL  Nu_x = h(x) D / k with h(x) = q''(x) / (T_w(x) - T_b(x))
 *     TH_MEAN   Nu_m = (1/x*) * integral of Nu_x over 0..x*, i.e. the mean
 *               of h over the heated length. For TH_WALL_T this is the
 *               usual log-mean definition, Nu_m = ln(1/theta_b)/(4 x*)
 *               (q = h_m A dT_lm). For TH_WALL_H it is the mean of h as
 *               tabulated by Shah & London (1978); it is NOT q''/(mean of
 *               T_w - T_b). For wall temperatures under uniform flux use
 *               TH_LOCAL at the point of interest.
 * Fully developed limits: Nu_T = 3.6568, Nu_H = 48/11 = 4.3636.
 * --------------------------------------------------------------------- */

/* THERMAL ENTRY, exact: Graetz series (T) and Siegel-Sparrow-Hallman
 * series (H) with eigenvalues computed from Kummer's function, and the
 * extended Leveque expansion below x* = 1e-6 (blended, continuous).
 * Accurate to about 1e-5 relative for every x* > 0. Cost: local 0.02-2 us
 * (2 us at x* = 1e-5, 0.2 us at 1e-3), mean ~30 ns; 20-35 ms once per wall
 * condition on first use (the eigenvalue table), then read-only. */
TH_API int th_thermal_entry_nusselt(double x_star, int wall, int averaging,
                                    double *nu);

/* COMBINED ENTRY, numerical: Nu for Prandtl number pr, computed for
 * 1e-6 <= pr <= 1e9 (TH_ERR_INPUT outside) and validated for
 * 0.5 <= pr <= 1e4 (TH_WARN_RANGE outside; below Pr ~ 0.1 the neglected
 * axial conduction matters unless Pe = Re Pr >> 100), and TH_WARN_RANGE
 * for x* < 1e-7, where the value is a power-law extrapolation. Accuracy about 0.1-0.3 % against
 * the converged solution (docs/laminar-entry.md). Cost: the first call
 * for a new (pr, wall) marches the equations (~15-25 ms); the table is then
 * kept in a mutex-protected cache of 16 (pr, wall) pairs and later calls
 * take ~50 ns. x_star = INFINITY gives the exact fully
 * developed value. */
TH_API int th_combined_entry_nusselt(double x_star, double pr, int wall,
                                     int averaging, double *nu);

/* The marching solver run afresh (no cache) with a chosen radial
 * resolution (cells, 20..5000; default 200) and axial step growth
 * (x_{n+1} = (1 + growth) x_n, 0.001..0.5; default 0.02), for convergence
 * studies and checks; milliseconds to seconds per call. entry is
 * th_entry_kind: TH_ENTRY_COMBINED marches the combined entry as above;
 * TH_ENTRY_THERMAL marches the thermal entry (parabolic velocity from the
 * start), which the exact series solves, so the solver can be checked. */
TH_API int th_entry_march_study(int entry, double x_star, double pr, int wall,
                                int averaging, int cells, double growth,
                                double *nu);

/* HYDRODYNAMIC ENTRY from a uniform inlet velocity (the flow part of the
 * combined entry): apparent Darcy friction factor times Re,
 * (f_app Re) = 2 (p_in - p(x)) / (rho u_m^2) / (x/D) / Re, so that the
 * pressure drop from the inlet to x is dp = f_app (x/D) rho u_m^2 / 2
 * (it includes the momentum change and the extra wall shear of the
 * developing profile). x_plus = x/(D Re) > 0; INFINITY gives 64.
 * Fanning = Darcy/4. TH_WARN_RANGE below x+ = 1e-8 (extrapolated). */
TH_API int th_combined_entry_friction(double x_plus, double *f_re_app);

/* Eigenvalue n >= 0 and series coefficient used by
 * th_thermal_entry_nusselt, for inspection:
 *   TH_WALL_T: lambda_n and G_n (Shah & London 1978 notation):
 *     Nu_x = sum G_n e^{-2 lambda_n^2 x*} / (2 sum (G_n/lambda_n^2) e^{...});
 *     lambda_0 = 2.70436, G_0 = 0.74877.
 *   TH_WALL_H: beta_n (n = 0 is the first non-zero root, 5.06751) and
 *     c_n = 1/(2 A_n beta_n^4) in the notation of Siegel, Sparrow &
 *     Hallman: Nu_x = 1/(11/48 - sum c_n e^{-2 beta_n^2 x*}).
 * Pairs n < 120 are computed from Kummer's function; 120 <= n < 1200 come
 * from the large-n asymptotic forms (fitted corrections); n >= 1200 is
 * TH_ERR_INPUT. */
TH_API int th_graetz_eigen(int wall, int n, double *lambda, double *coef);

/* Laminar fully developed values of a duct (th_duct_shape; duct_ratio as
 * described there) on the hydraulic diameter: Darcy f Re, Nu_T and Nu_H
 * (for the rectangle Nu_H1: axially uniform flux, peripherally uniform
 * wall temperature). Any output pointer may be NULL (at least one must be
 * given). Circle: 64, 3.6568, 4.3636 (ratio ignored). Rectangle: Shah &
 * London (1978) fits, 0 < ratio <= 1. Parallel plates, both heated: 96,
 * 7.5407, 8.2353 (ratio ignored). Annulus, inner wall heated and outer
 * insulated: handbook table (Lundberg, Reynolds & Kays 1963), ratio =
 * d_inner/d_outer in (0, 1]; TH_WARN_RANGE below 0.05 (extrapolated). */
TH_API int th_duct_laminar(int shape, double ratio, double *f_re,
                           double *nu_t, double *nu_h);

/* Concentric annulus with either wall heated and the other insulated. */
typedef enum th_annulus_wall {
    TH_ANNULUS_INNER_HEATED = 0,  /* inner tube heated, shell insulated */
    TH_ANNULUS_OUTER_HEATED = 1   /* shell heated, inner tube insulated */
} th_annulus_wall;
/* Darcy f Re (exact laminar solution), Nu_T and Nu_H on D_h = d_outer -
 * d_inner, ratio = d_inner/d_outer in (0, 1]. Inner heated: TH_WARN_RANGE
 * below ratio 0.05 (Nu grows without bound as the inner tube thins; the
 * value is an extrapolation). NULL outputs are skipped. */
TH_API int th_annulus_laminar(double ratio, int heated_wall, double *f_re,
                              double *nu_t, double *nu_h);


/* @@SECTION tube-solve@@ */
/* ------------------------------------------------------------------------
 * Whole-tube answers      (lib/src/tube_fluid.cpp, tube_model.cpp,
 *                          tube_solve.cpp, tube_inverse.cpp,
 *                          tube_report.cpp; docs/tube-solve.md)
 *
 * One call takes a fluid, an inlet state, a flow, a geometry and a wall
 * condition and returns the outlet temperature, the heat rate, the mean
 * coefficient, the pressure drop and the wall temperatures, with the
 * Nusselt method used and why. Internally it uses th_nusselt(), the
 * friction factors of th_friction_factor() (plus th_combined_entry_friction
 * and th_duct_laminar for laminar flow), th_entry_state() and the property
 * functions above.
 *
 * Two ways to solve (th_tube_options.segments):
 *   one-shot (segments = 0, default): properties at the mean bulk
 *     temperature (t_in + t_out)/2, one mean coefficient over 0..L;
 *   marching (segments = N >= 1): N equal segments, each with properties
 *     at its own mean bulk temperature and the coefficient of that segment
 *     from the mean Nusselt number over 0..x (entry effects included):
 *         h_seg = (x_b h_mean(0..x_b) - x_a h_mean(0..x_a)) / (x_b - x_a).
 *   With constant properties and a uniform wall temperature or flux the two
 *   agree exactly; with an outside fluid they differ where h varies along
 *   the tube (the marched answer is then the better one).
 *
 * The numerical combined-entry Nusselt number (TH_NU_COMBINED_ENTRY_NUMERIC,
 * the automatic choice for laminar flow from a uniform inlet) costs a
 * march of its own equations at every new Prandtl number; for fluids with
 * varying properties the solver evaluates it on a fixed grid of Prandtl
 * numbers (ratio 1.1) and interpolates in ln Pr (cubic, continuous;
 * within 1e-6 of the direct value).
 *
 * Iteration: t_out (and, per segment, the segment outlet) is the root of
 * G(t) - t, G being the outlet computed with properties at the mean of
 * inlet and t; bracketed between the inlet and the limiting temperature
 * (wall or outside fluid) and solved by toms748 (Boost.Math) until the
 * bracket is narrower than options.tolerance (default 1e-9 K). The wall
 * temperature used for the viscosity ratio and the Gnielinski property
 * correction is iterated inside each evaluation (Steffensen) to
 * tolerance/10. A result whose residual |G(t_out) - t_out| exceeds
 * 10 x tolerance is not written: TH_ERR_NO_CONVERGENCE (this is also what
 * happens when an automatic method choice jumps between two correlations
 * at the answer; choose the method then).
 *
 * Energy balance: q = mdot (h(t_out) - h(t_in)) with the fluid's specific
 * enthalpy (water IF97, air ideal gas, user fluids the integral of the
 * piecewise-linear cp); the exponential relations use the mean heat
 * capacity cp_mean = (h(t_out) - h(t_in)) / (t_out - t_in), so the
 * balance q = UA LMTD closes to the iteration tolerance.
 *
 * Properties are evaluated at the inlet pressure throughout; a warning is
 * given when the pressure drop exceeds 10 % of it (common practice limit
 * for treating a gas as incompressible). Wall temperatures are those of
 * the inner surface seen by the fluid (on the fluid side of any fouling).
 *
 * Status: TH_OK, or TH_WARN_RANGE when any method, property or
 * correlation was used outside its range (every note in the result's
 * notes[]); TH_ERR_INPUT for bad or missing input; TH_ERR_STATE when the
 * fluid leaves its property range (e.g. water that would boil in the
 * bulk); TH_ERR_NO_CONVERGENCE; TH_ERR_UNREACHABLE for inverse targets
 * that no length or flow gives.
 * --------------------------------------------------------------------- */

/* Fluids. */
typedef enum th_fluid_kind {
    TH_FLUID_UNSET = -1, /* th_tube_case_init's value: must be chosen     */
    TH_FLUID_WATER = 0,  /* liquid water, th_water_props at (T, p_in)     */
    TH_FLUID_AIR = 1,    /* dry air, th_air_props at (T, p_in)            */
    TH_FLUID_USER = 2    /* the caller's table below                     */
} th_fluid_kind;

/* Largest number of points of a user property table. */
#define TH_FLUID_TABLE_MAX 16

/* A fluid. For TH_FLUID_USER, n points of (t, rho, cp, mu, k):
 *   n = 1: constant properties (t[0] is ignored);
 *   n >= 2: t strictly increasing; rho, cp and k interpolated linearly in
 *   t, mu log-linearly (ln mu linear in t); outside t[0]..t[n-1] the end
 *   segments are extrapolated with TH_WARN_RANGE, and a value that would
 *   not be positive there gives TH_ERR_STATE.
 * The specific enthalpy of a user fluid is the exact integral of its
 * piecewise-linear cp (zero at t[0]). */
typedef struct th_fluid {
    int kind;   /* th_fluid_kind                                          */
    int gas;    /* user fluids: 1 = a gas (Gnielinski temperature-ratio
                   correction), 0 = a liquid (Prandtl-ratio correction);
                   water and air set it themselves                        */
    int n;      /* number of table points, 1..TH_FLUID_TABLE_MAX          */
    double t[TH_FLUID_TABLE_MAX];   /* temperature           [K]          */
    double rho[TH_FLUID_TABLE_MAX]; /* density               [kg/m3]      */
    double cp[TH_FLUID_TABLE_MAX];  /* heat capacity         [J/(kg K)]   */
    double mu[TH_FLUID_TABLE_MAX];  /* dynamic viscosity     [Pa s]       */
    double k[TH_FLUID_TABLE_MAX];   /* thermal conductivity  [W/(m K)]    */
} th_fluid;

/* Cross-section and length. Which fields apply depends on shape:
 *   TH_DUCT_CIRCLE           d = inside diameter
 *   TH_DUCT_RECTANGLE        a, b = the two inside sides; all four walls
 *                            heated
 *   TH_DUCT_PARALLEL_PLATES  a = spacing, b = plate width (b >> a);
 *                            D_h = 2 a, both plates heated (perimeter 2 b)
 *   TH_DUCT_ANNULUS          d = inside diameter of the outer tube,
 *                            d_inner = outside diameter of the inner tube;
 *                            inner wall heated, outer insulated
 * Derived (reported in th_tube_result): hydraulic diameter D_h = 4 A /
 * P_wetted, flow area A, heated perimeter P. */
typedef struct th_tube_geometry {
    int shape;         /* th_duct_shape, default TH_DUCT_CIRCLE            */
    double d;          /* [m] see above                                    */
    double d_inner;    /* [m] annulus only                                 */
    double a;          /* [m] rectangle side, or plate spacing             */
    double b;          /* [m] rectangle side, or plate width               */
    double length;     /* heated length L [m] > 0                          */
    double roughness;  /* absolute roughness eps [m] >= 0, default 0       */
} th_tube_geometry;

/* Wall conditions. */
typedef enum th_tube_wall_kind {
    TH_TUBE_WALL_UNSET = -1,  /* th_tube_case_init's value                */
    TH_TUBE_WALL_TEMPERATURE = 0, /* inner surface held at t_wall         */
    TH_TUBE_WALL_FLUX = 1,    /* uniform flux q_flux over the heated
                                 perimeter, positive into the fluid       */
    TH_TUBE_WALL_OUTSIDE = 2  /* an outside fluid at t_outside, through
                                 inside fouling, the wall, outside fouling
                                 and an outside coefficient               */
} th_tube_wall_kind;

typedef struct th_tube_wall {
    int kind;          /* th_tube_wall_kind                               */
    double t_wall;     /* TEMPERATURE: [K]                                */
    double q_flux;     /* FLUX: [W/m2], on the heated inner surface       */
    double t_outside;  /* OUTSIDE: outside fluid temperature [K]          */
    double h_outside;  /* OUTSIDE: outside coefficient [W/(m2 K)] > 0 on
                          the outer surface; INFINITY (default) holds the
                          outer surface at t_outside                      */
    double k_wall;     /* OUTSIDE: wall conductivity [W/(m K)] > 0 (needed
                          when thickness > 0)                             */
    double thickness;  /* OUTSIDE: wall thickness [m] >= 0, default 0.
                          Circle: cylindrical wall from d to d + 2 t;
                          ducts: a thin plane wall of the heated area     */
    double rf_inside;  /* OUTSIDE: fouling [m2 K/W] >= 0 on the inner
                          surface, default 0                              */
    double rf_outside; /* OUTSIDE: fouling [m2 K/W] >= 0 on the outer
                          surface, default 0                              */
} th_tube_wall;

/* Automatic choice for the int options below that allow it. */
#define TH_TUBE_AUTO (-1)
/* Largest number of marching segments. */
#define TH_TUBE_SEGMENTS_MAX 100000

typedef struct th_tube_options {
    int method;          /* th_nusselt_method, default TH_NU_AUTO          */
    int friction;        /* th_friction_method, default TH_F_AUTO: with it
                            laminar flow uses the apparent friction of the
                            developing flow (circle, TH_ENTRY_COMBINED) or
                            the duct's own f Re (th_duct_laminar)          */
    int entry;           /* th_entry_kind for laminar entry, default
                            TH_ENTRY_COMBINED (uniform inlet velocity)      */
    int correction;      /* th_property_correction, or TH_TUBE_AUTO
                            (default): liquids TH_CORR_LIQUID, gases
                            TH_CORR_GAS                                    */
    int nu_wall;         /* th_wall_condition for the Nusselt number, or
                            TH_TUBE_AUTO (default): H for a flux, T
                            otherwise                                      */
    int length_factor;   /* Gnielinski 1 + (D/L)^(2/3) factor, default 1   */
    int segments;        /* 0 (default): one-shot; 1..TH_TUBE_SEGMENTS_MAX:
                            marching                                       */
    double tolerance;    /* on temperatures [K], 1e-12..1, default 1e-9    */
    int max_iterations;  /* per root search, 5..1000, default 100         */
} th_tube_options;

/* A complete case. Initialise with th_tube_case_init(), then set the
 * fluid, t_in, p_in, mdot, the geometry and the wall; every physical
 * value is 0 (invalid) until given. */
typedef struct th_tube_case {
    th_fluid fluid;
    double t_in;        /* inlet bulk temperature [K] > 0                 */
    double p_in;        /* inlet pressure, absolute [Pa] > 0 (properties
                           of water and air; the pressure-drop warning)    */
    double mdot;        /* mass flow [kg/s] > 0                           */
    th_tube_geometry geometry;
    th_tube_wall wall;
    th_tube_options options;
} th_tube_case;

/* Defaults as stated above: fluid and wall kinds unset, every physical
 * value 0, geometry circular, options as documented. */
TH_API int th_tube_case_init(th_tube_case *c);
/* Convenience for flat argument lists (spreadsheets, scripts): sets the
 * fluid kind, the cross-section from two sizes and the wall from one
 * value, leaving every other field of *c as it is.
 *   fluid      th_fluid_kind; TH_FLUID_USER also sets n = 1 (constant
 *              properties in rho[0], cp[0], mu[0], k[0]) when n is 0
 *   shape      th_duct_shape with size1, size2 [m]:
 *              circle: size1 = d (size2 ignored); rectangle: sides size1
 *              and size2; parallel plates: spacing size1, width size2;
 *              annulus: outer tube's inside diameter size1, inner tube's
 *              outside diameter size2
 *   wall_kind  th_tube_wall_kind with value: the wall temperature [K], the
 *              flux [W/m2] or the outside fluid temperature [K]
 * Values are checked when the case is solved, except that the kinds and
 * shape must be known ones (else TH_ERR_INPUT). */
TH_API int th_tube_case_set(th_tube_case *c, int fluid, int shape,
                            double size1, double size2, int wall_kind,
                            double value);
/* Convenience: *f becomes a user fluid with constant properties
 * rho [kg/m3], cp [J/(kg K)], mu [Pa s], k [W/(m K)] (all > 0); gas as in
 * th_fluid. */
TH_API int th_fluid_constant(th_fluid *f, double rho, double cp, double mu,
                             double k, int gas);
/* Properties of any th_fluid at t [K] and p [Pa] (p is ignored by user
 * fluids but must be > 0): the same values the tube solver uses.
 * out->range_note names an extrapolation. */
TH_API int th_fluid_props_at(const th_fluid *f, double t, double p,
                             th_fluid_props *out);

/* Most notes a result carries. */
#define TH_TUBE_NOTES_MAX 6

typedef struct th_tube_result {
    /* main answers */
    double t_out;        /* outlet bulk temperature [K]                   */
    double q;            /* heat rate into the fluid [W], negative when
                            cooled; = mdot (h(t_out) - h(t_in))           */
    double h_mean;       /* mean inside coefficient over 0..L [W/(m2 K)]  */
    double nu_mean;      /* h_mean D_h / k at t_bulk_mean                 */
    double ua;           /* overall conductance [W/K] (inside only for a
                            wall temperature; through every resistance for
                            an outside fluid; h_mean P L for a flux)      */
    double ntu;          /* ua / (mdot cp_mean)                           */
    double t_wall_in;    /* inner-surface temperature at the inlet [K]     */
    double t_wall_out;   /* ... at the outlet [K]. One-shot: with h_mean;
                            marching: with the local coefficient          */
    double dp;           /* pressure drop p_in - p_out [Pa]: friction plus
                            the momentum change G^2 (1/rho_out - 1/rho_in) */
    double dp_friction;  /* its friction part [Pa]                        */
    /* groups and state at the mean bulk temperature */
    double t_bulk_mean;  /* (t_in + t_out)/2 [K]                          */
    double re;           /* Reynolds number on D_h                        */
    double pr;           /* Prandtl number                                */
    int regime;          /* th_regime                                     */
    double f;            /* mean Darcy friction factor over 0..L, as used
                            for dp (see options.friction); marching: the
                            length mean of the segments' values           */
    double velocity;     /* mean velocity at t_bulk_mean [m/s]             */
    double cp_mean;      /* (h(t_out) - h(t_in)) / (t_out - t_in) [J/(kg K)]*/
    double mu_ratio;     /* mu_bulk / mu_wall used (marching: in the last
                            segment)                                       */
    double l_over_d;     /* L / D_h                                        */
    int hydro_developed;   /* 1 if the velocity is developed at the outlet */
    int thermal_developed; /* 1 if the temperature profile is developed at
                              the outlet (th_entry_state, TH_ENTRY_AUTO)   */
    double x_fd_thermal_over_d; /* thermal entry length / D_h             */
    /* geometry */
    double d_h;          /* hydraulic diameter [m]                         */
    double area;         /* flow area [m2]                                 */
    double perimeter;    /* heated perimeter [m]                           */
    /* method */
    int method;          /* th_nusselt_method used (marching: at the last
                            segment)                                       */
    const char *method_name; /* static display name                       */
    const char *reason;  /* static: why (TH_NU_AUTO) or "chosen by caller" */
    /* iteration */
    int iterations;      /* evaluations of the outer root search (summed
                            over the segments when marching)               */
    double residual;     /* final |G(t_out) - t_out| [K] (largest segment) */
    int segments;        /* 0 one-shot, else the number marched            */
    /* warnings */
    int note_count;      /* number of notes, 0..TH_TUBE_NOTES_MAX          */
    const char *notes[TH_TUBE_NOTES_MAX]; /* static texts, distinct; unused
                            entries are ""                                  */
} th_tube_result;

/* Solve the tube (one-shot or marching by c->options.segments). */
TH_API int th_tube_solve(const th_tube_case *c, th_tube_result *out);

/* Marching profile with n_points - 1 equal segments (2 <= n_points <=
 * TH_TUBE_SEGMENTS_MAX + 1; options.segments is ignored). Each array has
 * n_points entries at x_i = i L/(n_points - 1), any may be NULL:
 *   x       position from the inlet [m]
 *   t_bulk  bulk temperature [K]
 *   t_wall  inner-surface temperature [K]
 *   h       local coefficient [W/(m2 K)], d(x h_mean)/dx; at x = 0, where
 *           a developing flow's local value is unbounded, the mean over the
 *           first segment.
 * summary (may be NULL) gets the marched th_tube_result. Arrays are
 * written only on success. */
TH_API int th_tube_profile(const th_tube_case *c, int n_points, double *x,
                           double *t_bulk, double *t_wall, double *h,
                           th_tube_result *summary);

/* Inverse design. Each solves th_tube_solve (same options) inside a
 * bracketed root search: the bracket starts at the case's own value
 * (length or mdot, which must be > 0 as a first guess) and is widened by
 * a factor 4 per step within the limits stated below; then toms748
 * narrows it to 1e-12 relative. result (may be NULL) gets the solved case
 * at the answer.
 *
 * Length [m] for an outlet bulk temperature t_target [K]. Searched within
 * 1e-3 <= L/D_h <= 1e8. TH_ERR_UNREACHABLE when t_target is not strictly
 * between t_in and the wall / outside temperature (or, for a flux, on the
 * side the flux drives), or no length in range reaches it. */
TH_API int th_tube_length_for_outlet(const th_tube_case *c, double t_target,
                                     double *length, th_tube_result *result);
/* Mass flow [kg/s] for an outlet bulk temperature t_target [K]. Searched
 * within 1e-6 <= Re <= 1e8 (Re at the inlet temperature). The outlet
 * temperature falls with the flow except in transitional flow, where two
 * flows can give the same outlet: the root in the first bracket found is
 * returned (check result->regime). TH_ERR_UNREACHABLE as above. */
TH_API int th_tube_flow_for_outlet(const th_tube_case *c, double t_target,
                                   double *mdot, th_tube_result *result);
/* Mass flow [kg/s] for a duty q_target [W] (positive heats the fluid).
 * Same search range. TH_ERR_UNREACHABLE when the sign is wrong for the
 * wall condition, when a uniform flux fixes the duty at another value,
 * when q_target reaches the limit of an outside fluid (every resistance
 * but the inside one, with an infinite inside coefficient), or when even
 * Re = 1e8 does not transfer it. */
TH_API int th_tube_flow_for_duty(const th_tube_case *c, double q_target,
                                 double *mdot, th_tube_result *result);

/* A report checkable cell by cell: labelled rows of (label, value, unit).
 * Text rows (regime, entry state, method, reason, status, notes) have
 * is_text = 1 and their value in text; number rows have text "". */
typedef struct th_tube_report_row {
    const char *label; /* static, e.g. "Reynolds number Re"               */
    double value;      /* number rows                                      */
    const char *unit;  /* static, e.g. "W/(m2 K)", "-" dimensionless      */
    int is_text;       /* 1: the value is text                            */
    const char *text;  /* static text, "" for number rows                  */
} th_tube_report_row;

/* Rows of the report: the fixed rows plus one per note. */
#define TH_TUBE_REPORT_ROWS (32 + TH_TUBE_NOTES_MAX)

/* Fill rows[0..*n_rows-1] from a solved case: status is the status
 * th_tube_solve returned for it (shown in a row). rows must hold
 * TH_TUBE_REPORT_ROWS entries. */
TH_API int th_tube_report(const th_tube_result *r, int status,
                          th_tube_report_row rows[TH_TUBE_REPORT_ROWS],
                          int *n_rows);

/* Single values of a result, by id: */
typedef enum th_tube_output {
    TH_TUBE_OUT_T_OUT = 0,      /* outlet temperature [K]                 */
    TH_TUBE_OUT_Q = 1,          /* heat rate [W]                          */
    TH_TUBE_OUT_H = 2,          /* mean coefficient [W/(m2 K)]            */
    TH_TUBE_OUT_NU = 3,         /* mean Nusselt number                    */
    TH_TUBE_OUT_RE = 4,         /* Reynolds number                        */
    TH_TUBE_OUT_PR = 5,         /* Prandtl number                         */
    TH_TUBE_OUT_REGIME = 6,     /* th_regime                              */
    TH_TUBE_OUT_F = 7,          /* Darcy friction factor                  */
    TH_TUBE_OUT_DP = 8,         /* pressure drop [Pa]                     */
    TH_TUBE_OUT_UA = 9,         /* UA [W/K]                               */
    TH_TUBE_OUT_NTU = 10,       /* NTU                                    */
    TH_TUBE_OUT_T_WALL_IN = 11, /* wall temperature at the inlet [K]      */
    TH_TUBE_OUT_T_WALL_OUT = 12,/* wall temperature at the outlet [K]     */
    TH_TUBE_OUT_METHOD = 13,    /* th_nusselt_method used                 */
    TH_TUBE_OUT_ITERATIONS = 14,/* iteration count                        */
    TH_TUBE_OUT_COUNT = 15
} th_tube_output;
TH_API int th_tube_result_value(const th_tube_result *r, int which,
                                double *value);

#ifdef __cplusplus
} /* extern "C" */
#endif

#endif /* TUBEHEAT_H */
