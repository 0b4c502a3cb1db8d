/*
 * tubeheat.h - tube-side convective heat transfer, the public C API.
 *
 * This header is the reference for the library. Every function:
 *   - returns a status code (th_status, below) and writes its results
 *     through pointer arguments; nothing is returned any other way;
 *   - writes its outputs when the status is TH_OK or TH_WARN_RANGE, and
 *     leaves them untouched on any error;
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
     * (e.g. inner diameter >= outer diameter), unknown option flag. */
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

/* ------------------------------------------------------------------------
 * Nusselt number by chosen method     (laminar.cpp, turbulent.cpp,
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
 * fields it uses and ignores the rest. */
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
    double pr_wall;       /* Pr at the wall (TH_CORR_LIQUID), default = pr */
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
 * Agreement with the releases' verification tables is within 1e-8
 * relative; see docs/properties.md for the stated uncertainties of the
 * formulations (about 1 % for viscosity, 1.5-2 % for conductivity in the
 * liquid).
 *
 * Dry air: ideal gas (rho = p/(R t), R = 287.117 J/(kg K)) with the ideal-
 * gas cp and h of Lemmon et al. (2000) and the dilute-gas viscosity and
 * conductivity of Lemmon & Jacobsen (2004). The density-dependent terms are
 * left out, so these are values "near atmospheric pressure":
 *     in range (TH_OK):          200 K <= t <= 2000 K and p <= 0.2 MPa
 *                                (within 1 % of the full formulations);
 *     extrapolated (TH_WARN_RANGE): 150 K <= t < 200 K, 2000 K < t <=
 *                                3000 K, or 0.2 MPa < p <= 1 MPa (up to
 *                                about 10 % off at 150 K and 1 MPa);
 *     TH_ERR_STATE:              t < 150 K, t > 3000 K or p > 1 MPa.
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

/* @@SECTION tube-solve@@ */

#ifdef __cplusplus
} /* extern "C" */
#endif

#endif /* TUBEHEAT_H */
