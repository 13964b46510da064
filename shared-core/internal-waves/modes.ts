import { GRAVITY } from '../quantities';
import { InputError } from '../core/errors';
import { positive, requireInRange } from '../core/range';
import type { MethodInfo } from '../core/method';
import { caution, type Warning } from '../core/warning';
import { interpolateSorted, largestFinite, type Profile } from '../profile/profile';
import { lowestEigenpairs, type TridiagonalPencil } from '../numerics/tridiagonal-eigen';

export const VERTICAL_MODES: MethodInfo = {
  id: 'vertical-modes',
  title: 'Internal-wave vertical normal modes of a stratified column (long waves, hydrostatic)',
  source:
    'Gill, A.E. (1982). Atmosphere–Ocean Dynamics. Academic Press, §6.11 (vertical normal modes, w″ + N²/c² w = 0, ' +
    'rigid lid and free-surface conditions) and §6.13 (constant N: c_n = NH/(nπ)); LeBlond, P.H., Mysak, L.A. (1978). ' +
    'Waves in the Ocean. Elsevier, §20. Solved by second-order finite differences and Sturm-sequence bisection ' +
    '(Barth, Martin & Wilkinson 1967).',
  equation: 'd²w/dz² + N²(z)/c² · w = 0, w(bottom) = 0; rigid lid w(0) = 0 or free surface dw/dz = g w/c² at z = 0',
  validity: {},
};

export type SurfaceCondition = 'rigid-lid' | 'free-surface';

/** Squared buoyancy frequency sampled at depths (positive down); linear between samples, constant beyond. */
export interface N2Column {
  depth: readonly number[];
  n2: readonly number[];
}

export interface ModeOptions {
  /** number of internal modes wanted (default 3) */
  modes?: number;
  /** grid cells over the depth (default 800) */
  cells?: number;
  surface?: SurfaceCondition;
}

/** One internal mode: long-wave phase speed and shapes on the grid depths. */
export interface VerticalMode {
  /** mode number n = 1, 2, … */
  n: number;
  /** long-wave phase speed c_n [m/s] */
  celerity: number;
  /** vertical-displacement (w) structure at `VerticalModes.depth`, max |w| = 1 [1] */
  displacement: number[];
  /** horizontal-velocity (and pressure) structure ∝ dw/dz at `VerticalModes.depth`, max |u| = 1 [1] */
  horizontalVelocity: number[];
}

/** Result of the mode solver; depth and every shape array share one grid (surface to bottom). */
export interface VerticalModes {
  /** grid depths [m], 0 at the surface, the last at the bottom */
  depth: number[];
  /** N² on the grid [1/s2] (negative values clipped to 0) */
  n2: number[];
  modes: VerticalMode[];
  /** with a free surface: the barotropic (surface) mode speed, ≈ √(gH) [m/s] */
  surfaceCelerity?: number;
  surface: SurfaceCondition;
  warnings: Warning[];
}

/**
 * Vertical normal modes from an N² column: w″ + N²/c² w = 0 on 0 ≤ d ≤ H with w(H) = 0, discretised with
 * linear finite elements (lumped mass) on a uniform grid; eigenvalues λ = 1/c² of the pencil A w = λ B w,
 * A the stiffness (−d²/dz²) and B = diag(N² Δ) (+ g at the surface node for the free-surface condition).
 * @param column N² samples [1/s2] at depths [m]
 * @param bottom water depth H [m]
 * @returns phase speeds c_n [m/s] (descending) and shapes; `surfaceCelerity` with a free surface
 * @source Gill (1982) §6.11; Barth, Martin & Wilkinson (1967)
 * @validity linear, hydrostatic (wavelength ≫ H), no background shear, flat bottom
 */
export function verticalModesFromN2(column: N2Column, bottom: number, options: ModeOptions = {}): VerticalModes {
  const H = requireInRange('depth', bottom, 'm', { ...positive, max: 11000 });
  const wanted = requireInRange('modes', options.modes ?? 3, '1', { min: 1, max: 50 });
  const cells = Math.round(requireInRange('cells', options.cells ?? 800, '1', { min: 4 * wanted + 8, max: 200000 }));
  const surface = options.surface ?? 'rigid-lid';
  if (column.depth.length === 0 || column.depth.length !== column.n2.length)
    throw new InputError(
      'n2',
      column.n2.length,
      '',
      'one N² per depth',
      'the N² column needs as many values as depths',
    );
  // the field name is built only for a value that fails (a column holds hundreds)
  column.n2.forEach((v, i) => {
    if (!(v >= -1 && v <= 1)) requireInRange(`n2[${i}]`, v, '1/s2', { min: -1, max: 1 });
  });
  const dz = H / cells;
  const depth = uniformGrid(cells, dz);
  const warnings: Warning[] = [];
  const raw = interpolateSorted(column.depth, column.n2, depth);
  if (raw.some((v) => v < 0))
    warnings.push(
      caution(
        'negative-n2-clipped',
        'N² is negative somewhere (a density inversion); those levels are treated as neutral (N² = 0).',
      ),
    );
  const n2 = raw.map((v) => Math.max(0, v));
  const first = surface === 'free-surface' ? 0 : 1; // rigid lid: w(0) = 0 removes the surface node
  const nodes = cells - first; // bottom node (w = 0) excluded
  const weight = new Float64Array(nodes);
  let positiveWeights = 0;
  for (let i = 0; i < nodes; i++) {
    weight[i] = first + i === 0 ? (n2[0] * dz) / 2 + GRAVITY : n2[first + i] * dz;
    if (weight[i] > 0) positiveWeights++;
  }
  const diag = new Float64Array(nodes).fill(2 / dz);
  if (first === 0) diag[0] = 1 / dz;
  const pencil: TridiagonalPencil = { diag, off: new Float64Array(nodes - 1).fill(-1 / dz), weight };
  const extra = surface === 'free-surface' ? 1 : 0;
  if (positiveWeights < wanted + extra) {
    throw new InputError(
      'n2',
      largestFinite(n2),
      '1/s2',
      'a stable stratification (N² > 0 over part of the column)',
      `the column has too little stratification for ${wanted} internal modes`,
    );
  }
  const pairs = lowestEigenpairs(pencil, wanted + extra);
  const toShape = (v: number[]) => {
    const w = depth.map((_, j) => (j < first || j === cells ? 0 : v[j - first]));
    const u = depth.map((_, j) => {
      const up = Math.max(j - 1, 0),
        down = Math.min(j + 1, cells);
      return (w[down] - w[up]) / ((down - up) * dz);
    });
    return { w: scaleToUnit(w), u: scaleToUnit(u) };
  };
  const modes = pairs.slice(extra).map((p, i) => {
    const s = toShape(p.vector);
    return { n: i + 1, celerity: 1 / Math.sqrt(p.value), displacement: s.w, horizontalVelocity: s.u };
  });
  return { depth, n2, modes, surfaceCelerity: extra ? 1 / Math.sqrt(pairs[0].value) : undefined, surface, warnings };
}

/** Depths 0, dz, 2dz, … cells·dz [m]. */
function uniformGrid(cells: number, dz: number): number[] {
  const depth = new Array<number>(cells + 1);
  for (let j = 0; j <= cells; j++) depth[j] = j * dz;
  return depth;
}

function scaleToUnit(v: number[]): number[] {
  let big = 0;
  for (const x of v) if (Math.abs(x) > Math.abs(big)) big = x;
  return big === 0 ? v : v.map((x) => x / big);
}

/**
 * Vertical normal modes of a measured profile: N² from the potential density on the grid
 * (N² = g/ρ̄ · dρ/dd, depth positive down), the column reaching from the surface to the deepest sample.
 * The top sample's density is carried up to the surface. See `verticalModesFromN2`.
 */
export function verticalModesFromProfile(p: Profile, options: ModeOptions = {}): VerticalModes {
  const H = p.depth[p.depth.length - 1];
  const cells = options.cells ?? 800;
  const dz = H / cells;
  const depth = uniformGrid(cells, dz);
  // density at the cell edges 0, dz/2, 3dz/2, …, H − dz/2, H; node j takes N² between edges j and j + 1
  const edges = new Array<number>(cells + 2);
  edges[0] = 0;
  for (let j = 0; j < cells; j++) edges[j + 1] = (j + 0.5) * dz;
  edges[cells + 1] = H;
  const rho = interpolateSorted(p.depth, p.density, edges);
  const n2 = depth.map((_, j) => {
    const ra = rho[j],
      rb = rho[j + 1];
    return (GRAVITY * (rb - ra)) / (((ra + rb) / 2) * (edges[j + 1] - edges[j]));
  });
  const out = verticalModesFromN2({ depth, n2 }, H, { ...options, cells });
  return { ...out, warnings: [...p.warnings, ...out.warnings] };
}

/** Constant-N column: N² = N² everywhere down to H. */
export function constantN2Column(buoyancyFrequency: number, depth: number): N2Column {
  const N = requireInRange('buoyancy_frequency', buoyancyFrequency, '1/s', { ...positive, max: 1 });
  const H = requireInRange('depth', depth, 'm', { ...positive, max: 11000 });
  return { depth: [0, H], n2: [N * N, N * N] };
}
