/**
 * The one glossary of symbols used by doc comments, UI labels and report tables.
 * Sign conventions: depth d is positive down from the water surface; z is height, positive up.
 * Every quantity inside shared-core is in SI; units appear only at the edges (shared-core/units).
 */
export interface QuantityDef {
  symbol: string;
  label: string;
  /** SI unit as written in results and the CLI (m3/s, kg/m3, m/s2 …); '1' for dimensionless */
  unit: string;
  note?: string;
}

export const QUANTITIES = {
  depth: { symbol: 'd', label: 'Depth below the surface', unit: 'm', note: 'positive down' },
  height: { symbol: 'z', label: 'Height', unit: 'm', note: 'positive up' },
  temperature: { symbol: 't', label: 'Temperature (ITS-90)', unit: 'degC' },
  salinity: { symbol: 'S', label: 'Practical salinity', unit: 'PSU', note: 'PSS-78, dimensionless' },
  sediment: { symbol: 'C', label: 'Suspended sediment concentration', unit: 'kg/m3' },
  pressure: { symbol: 'p', label: 'Sea pressure', unit: 'dbar', note: 'absolute pressure minus 10.1325 dbar' },
  density: { symbol: 'ρ', label: 'Density', unit: 'kg/m3' },
  reducedGravity: { symbol: 'g′', label: 'Reduced gravity', unit: 'm/s2', note: 'g Δρ / ρ_ref' },
  buoyancyFrequencySquared: { symbol: 'N²', label: 'Buoyancy frequency squared', unit: '1/s2' },
  buoyancyFrequency: { symbol: 'N', label: 'Buoyancy frequency', unit: '1/s' },
  velocity: { symbol: 'U', label: 'Velocity', unit: 'm/s' },
  discharge: { symbol: 'Q', label: 'Discharge', unit: 'm3/s' },
  kinematicViscosity: { symbol: 'ν', label: 'Kinematic viscosity', unit: 'm2/s' },
  thermalDiffusivity: { symbol: 'κ', label: 'Thermal diffusivity', unit: 'm2/s' },
  specificHeat: { symbol: 'c_p', label: 'Specific heat capacity', unit: 'J/(kg K)' },
  froude: { symbol: 'Fr', label: 'Densimetric Froude number', unit: '1' },
  dilution: { symbol: 'S', label: 'Dilution', unit: '1' },
} as const satisfies Record<string, QuantityDef>;

/** Standard acceleration of gravity [m/s2] (3rd CGPM, 1901). */
export const GRAVITY = 9.80665;
