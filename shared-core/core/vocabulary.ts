import { QUANTITIES as Q } from '../quantities';

/**
 * The words people read for the parameter and result names of the calc methods ("g_prime" → "Reduced
 * gravity g′"): one vocabulary for the workspace, the report and any other view. Labels carry no unit (the
 * view adds the unit of the display system); `formula` is a short definition shown in brackets.
 */
export interface NameWords {
  label: string;
  symbol?: string;
  formula?: string;
}

const w = (label: string, symbol?: string, formula?: string): NameWords => ({
  label,
  ...(symbol ? { symbol } : {}),
  ...(formula ? { formula } : {}),
});

/** Names shared by several methods, in their most common sense. */
const NAMES: Record<string, NameWords> = {
  temperature: w('Temperature', Q.temperature.symbol),
  salinity: w(Q.salinity.label, Q.salinity.symbol),
  sediment: w('Suspended sediment', Q.sediment.symbol),
  pressure: w(Q.pressure.label, Q.pressure.symbol),
  conductivity: w('Conductivity'),
  eos: w('Equation of state'),
  density: w(Q.density.label, Q.density.symbol),
  rho_upper: w('Upper-layer density', 'ρ₁'),
  rho_lower: w('Lower-layer density', 'ρ₂'),
  reference: w('Reference density'),
  g_prime: w(Q.reducedGravity.label, Q.reducedGravity.symbol),
  velocity: w(Q.velocity.label, Q.velocity.symbol),
  length: w('Length scale', 'L'),
  froude: w(Q.froude.label, Q.froude.symbol),
  kinematic_viscosity: w(Q.kinematicViscosity.label, Q.kinematicViscosity.symbol),
  file: w('Measured profile'),
  mixed_layer_depth: w('Mixed-layer depth'),
  thermocline_depth: w('Thermocline depth'),
  n2_max: w('Peak N²'),
  upper_thickness: w('Upper-layer thickness', 'h₁'),
  lower_thickness: w('Lower-layer thickness', 'h₂'),
  current_depth: w('Current thickness', 'h'),
  total_depth: w('Total depth', 'H'),
  depth: w('Water depth', 'H'),
  model: w('Front condition'),
  speed: w('Front speed', 'U'),
  lock_length: w('Lock length'),
  lock_depth: w('Lock depth'),
  time: w('Time since release', 't'),
  geometry: w('Spreading'),
  arrival_distance: w('Point of interest (distance)'),
  front_position: w('Front position'),
  front_speed: w('Front speed'),
  phase: w('Phase'),
  arrival_time: w('Arrival time at the point of interest'),
  flux: w('Inflow per width'),
  slope: w('Bed slope'),
  river_velocity: w('River velocity', 'U₀'),
  interfacial_friction: w('Interfacial friction factor', 'f_i'),
  river_froude: w('River Froude number', 'F₀', 'U₀/√(g′H)'),
  river_discharge: w('River discharge'),
  width: w('Width', 'W'),
  field_width: w('Wastefield width'),
  tidal_velocity: w('Tidal velocity (rms)', 'U_t'),
  richardson: w('Estuarine Richardson number', 'Ri_E'),
  class: w('Stratification class'),
  control: w('Control section'),
  net_discharge: w('Net discharge', 'Q₀'),
  end_width: w('Width at the channel ends'),
  reservoir_depth: w('Depth of the basin beyond the sill'),
  exchange_discharge: w('Exchange discharge'),
  upper_layer_discharge: w('Upper-layer discharge'),
  lower_layer_discharge: w('Lower-layer discharge'),
  wavelength: w('Wavelength', 'λ'),
  amplitude: w('Wave amplitude', 'a'),
  celerity: w('Interfacial wave speed', 'c'),
  long_wave_celerity: w('Long-wave speed', 'c₀'),
  polarity: w('Solitary-wave polarity'),
  buoyancy_frequency: w(Q.buoyancyFrequency.label, Q.buoyancyFrequency.symbol),
  modes: w('Number of modes'),
  basin_length: w('Basin length', 'L'),
  period: w('Internal seiche period', 'T₁'),
  wind_speed: w('Wind speed at 10 m', 'U₁₀'),
  wedderburn: w('Wedderburn number', 'W', 'g′h₁²/(u*²L)'),
  shear_velocity: w('Water friction velocity', 'u*'),
  upwelling_risk: w('Upwelling risk'),
  obstacle_height: w('Obstacle height', 'h'),
  lee_wavelength: w('Lee-wave length', 'λ', '2πU/N'),
  blocked: w('Blocked upstream'),
  discharge_per_width: w('Dense-layer discharge per width', 'q'),
  upstream_thickness: w('Upstream layer thickness', 'y₁'),
  upper_discharge: w('Upper-layer discharge per width'),
  downstream_thickness: w('Downstream layer thickness', 'y₂'),
  downstream_thickness_alt: w('Downstream thickness, interfacial-pressure closure', 'y₂′'),
  head_loss: w('Head loss'),
  structure: w('Structure'),
  opening: w('Opening'),
  interface_distance: w('Distance to the interface'),
  max_discharge_per_width: w('Largest discharge per width, near layer only'),
  max_discharge: w('Largest discharge, near layer only'),
  sink: w('Form of the intake'),
  position: w('Position of the intake'),
  critical_discharge: w('Critical discharge', 'Q_c'),
  discharge: w(Q.discharge.label, Q.discharge.symbol),
  port_depth: w('Port depth'),
  reservoir_length: w('Reservoir length at the intake level'),
  thickness: w('Withdrawal-layer total thickness, limit to limit', '2δ'),
  half_thickness: w('Withdrawal-layer half-thickness, port to one limit', 'δ'),
  thickness_low: w('Lowest total thickness of the published coefficients'),
  thickness_high: w('Highest total thickness of the published coefficients'),
  planned_discharge: w('Planned release through the intake'),
  entrainment_law: w('Entrainment law'),
  drag_coefficient: w('Drag of the bed and the interface', 'C_D'),
  initial_mixing: w('Mixing at the plunge line', 'Φ'),
  insertion_depth_low: w('Shallowest insertion depth of the published coefficients'),
  insertion_depth_high: w('Deepest insertion depth of the published coefficients'),
  discharge_ratio: w('Planned release over the critical discharge'),
  regime: w('Regime'),
  ports: w('Ports'),
  release: w('Total release'),
  target_temperature: w('Target release temperature'),
  interference: w('Overlapping withdrawal layers'),
  port_flows: w('Flow of each port'),
  feasible: w('Target met'),
  plunge_froude: w('Plunge Froude number', 'F_p'),
  plunge_depth: w('Plunge depth', 'h_p'),
  bed_slope: w('Bed slope', 'tan θ'),
  distance: w('Distance to the point of interest'),
  insertion_depth: w('Insertion depth'),
  insertion_distance: w('Insertion distance along the bed'),
  discharge_at_end: w('Discharge where the current leaves the bed'),
  travel_time: w('Travel time to the point of interest'),
  outcome: w('Outcome'),
  diameter: w('Port diameter', 'D'),
  current: w('Ambient current', 'u_a'),
  l_q: w('Jet length scale', 'L_Q', 'Q/√M'),
  l_m: w('Jet-to-plume length scale', 'L_M', 'M^¾/|B|^½'),
  l_crossflow_momentum: w('Crossflow momentum length scale', 'L_m', '√M/u_a'),
  l_crossflow_buoyancy: w('Crossflow buoyancy length scale', 'L_b', '|B|/u_a³'),
  l_strat_momentum: w('Stratification length scale of the jet', 'L_m′', '(M/N²)^¼'),
  l_strat_buoyancy: w('Stratification length scale of the plume', 'L_b′', '(|B|/N³)^¼'),
  angle: w('Port angle above horizontal', 'θ'),
  effluent_density: w('Effluent density', 'ρ_e'),
  ambient_density: w('Ambient density', 'ρ_a'),
  max_rise: w('Maximum rise above the port'),
  return_distance: w('Return-point distance'),
  return_dilution: w('Return-point dilution'),
  trap_height: w('Trap height above the port'),
  surface_dilution: w('Dilution at the surface'),
  spacing: w('Port spacing'),
  diffuser_length: w('Diffuser length'),
  current_angle: w('Current angle to the jet'),
  max_path_length: w('Longest path followed'),
  dense_jet_dilution: w('Dense-jet dilution used'),
  return_dilution_lab: w('Return-point dilution, laboratory correlations'),
  return_distance_lab: w('Return-point distance, laboratory correlations'),
  max_rise_lab: w('Terminal rise, laboratory correlations'),
  return_dilution_chosen: w('Return-point dilution used for compliance'),
  near_field_dilution: w('Centreline dilution at the end of the near field'),
  water_depth: w('Water depth above the diffuser'),
  dilution: w('Centreline dilution', Q.dilution.symbol),
  dilution_average: w('Flux-average dilution'),
  rise_height: w('Rise height above the ports'),
  merge_height: w('Merging height above the ports'),
  merge_distance: w('Merging distance'),
  merge_dilution: w('Dilution at merging'),
  single_port_dilution: w('Single-port dilution'),
  discharge_per_length: w('Discharge per diffuser length', 'q'),
  effluent: w('Effluent concentration', 'C_e'),
  ambient: w('Ambient concentration', 'C_a'),
  criterion: w('Criterion concentration', 'C_c'),
  alpha: w('4/3-law coefficient', 'α'),
  salinity_difference: w('Salinity difference across the gate', 'ΔS'),
  open_time: w('Time the gate stands open'),
  exchanged_volume: w('Volume exchanged each way'),
  salt_mass: w('Salt carried into the fresh side'),
  exchanged_fraction: w('Share of the chamber exchanged'),
  traverse_time: w('Time for the fronts to reach the chamber ends', 'L/U'),
  hypsography: w('Area against depth (hypsographic curve)'),
  lake_number: w('Lake number', 'L_N'),
  schmidt_stability: w('Schmidt stability', 'S_t'),
  centre_of_volume_height: w('Height of the centre of volume above the deepest point', 'z_g'),
  stability_statement: w('What the Lake number means'),
  interface_above_crest: w('Interface height above the crest', 'Y'),
  crest_thickness: w('Dense-layer thickness at the crest', 'h_c', '2Y/3'),
  crest_velocity: w('Dense-layer velocity at the crest'),
  approach_velocity: w('Velocity head of the approaching layer'),
  contraction: w('Contraction coefficient under the lip', 'C_c'),
  approach_head_ratio: w('Change of the limit by the approach velocity head'),
};

/** Where one method uses a name in a sense of its own: `method.name`, or `method.result.name` / `method.input.name`. */
const IN_METHOD: Record<string, NameWords> = {
  'salt-wedge.length': w('Salt wedge length'),
  'front-speed.froude': w('Froude number of the current', 'Fr', 'U/√(g′h)'),
  'obstacle-flow.froude': w('Obstacle Froude number', 'Fr', 'U/(Nh)'),
  'internal-jump.froude': w('Upstream layer Froude number', 'Fr₁', 'q/√(g′y₁³)'),
  'jet-length-scales.froude': w('Port densimetric Froude number', 'Fr'),
  'release-blend.temperature': w('Release temperature'),
  'underflow.temperature': w('River temperature'),
  'underflow.salinity': w('River salinity'),
  'underflow.sediment': w('River suspended sediment'),
  'plunge-depth.discharge': w('River inflow', 'Q'),
  'underflow.discharge': w('River inflow', 'Q'),
  'withdrawal-layer.discharge': w('Intake discharge', 'Q'),
  'line-plume.dilution': w('Minimum dilution'),
  'required-dilution.dilution': w('Required dilution', 'S', '(C_e − C_a)/(C_c − C_a)'),
  'far-field.dilution': w('Far-field dilution factor'),
  'far-field.input.width': w('Wastefield width at the end of the near field'),
  'far-field.field_width': w('Wastefield width at the distance'),
  'far-field.distance': w('Distance beyond the near field'),
  'diffuser-plume.ports': w('Number of ports'),
  'diffuser-plume.current_angle': w('Current angle to the diffuser axis'),
  'exchange-flow.depth': w('Depth at the control'),
  'exchange-flow.width': w('Width at the control'),
  'estuarine-richardson.width': w('Estuary width', 'W'),
  'withdrawal-two-layer.width': w('Slot width'),
  'withdrawal-layer.width': w('Slot width'),
  'skimming-withdrawal.width': w('Width of the opening'),
  'navigation-lock.length': w('Chamber length', 'L'),
  'navigation-lock.width': w('Chamber width', 'B'),
  'navigation-lock.depth': w('Water depth in the chamber', 'H'),
  'sill-overflow.width': w('Crest width'),
  'withdrawal-layer.regime': w('Withdrawal regime'),
};

/** Whether a name has words of its own (not the fallback). */
export function hasWords(name: string): boolean {
  return name in NAMES || /^celerity_\d+$/.test(name);
}

/**
 * The label and symbol of a parameter or result name, in the sense `method` gives it when one is named;
 * `role` tells an input from a result of the same name. An unknown name reads as its words, capitalised.
 */
export function labelOf(name: string, method?: string, role?: 'input' | 'result'): NameWords {
  const own = method && (IN_METHOD[`${method}.${role}.${name}`] ?? IN_METHOD[`${method}.${name}`]);
  if (own) return own;
  const mode = /^celerity_(\d+)$/.exec(name);
  if (mode) return w(`Mode ${mode[1]} wave speed`, `c${mode[1]}`);
  const known = NAMES[name];
  if (known) return known;
  const words = name.replace(/_/g, ' ');
  return w(words.charAt(0).toUpperCase() + words.slice(1));
}

/** The name as one line of text: "Jet length scale L_Q (Q/√M)". */
export function nameText(name: string, method?: string, role?: 'input' | 'result'): string {
  const { label, symbol, formula } = labelOf(name, method, role);
  const bracketed = formula && (formula.startsWith('(') && formula.endsWith(')') ? formula : `(${formula})`);
  return [label, symbol, bracketed].filter(Boolean).join(' ');
}

/** The topic folders as words, for method lists. */
export const TOPIC_WORDS: Record<string, string> = {
  water: 'Water properties',
  profile: 'Profiles',
  'gravity-currents': 'Gravity currents',
  estuaries: 'Estuaries',
  'internal-waves': 'Internal waves',
  hydraulics: 'Stratified hydraulics',
  withdrawal: 'Selective withdrawal',
  inflows: 'Inflows',
  jets: 'Jets and plumes',
  'mixing-zone': 'Mixing zone',
};
