/** Boltzmann constant k_B in J/K (exact, SI 2019). */
export const BOLTZMANN_CONSTANT = 1.380649e-23;
/** Avogadro constant N_A in 1/mol (exact, SI 2019). */
export const AVOGADRO_CONSTANT = 6.02214076e23;
/** Elementary charge e in C (exact, SI 2019). */
export const ELEMENTARY_CHARGE = 1.602176634e-19;
/** Vacuum permittivity ε₀ in F/m (CODATA 2018 recommended value). */
export const VACUUM_PERMITTIVITY = 8.8541878128e-12;
/** Standard acceleration of gravity g in m/s² (exact, CGPM 1901). */
export const STANDARD_GRAVITY = 9.80665;
/** 0 °C in kelvin. */
export const ZERO_CELSIUS = 273.15;
/** Relative permittivity of water at 25 °C used when a solvent gives none (common practice). */
export const WATER_RELATIVE_PERMITTIVITY = 78.4;
