/**
 * Bounds on the size of the work one estimate may ask for, so that every computation finishes in a
 * predictable time. The site schema, the calc parameters and the CLI enforce them with a message naming
 * the field and the limit; DEVELOPERS.md ("Bounded work") lists them.
 */
export const LIMITS = {
  /** ports of one intake (the release blend grows linearly with them) */
  intakePorts: 200,
  /** ports of one outfall diffuser */
  diffuserPorts: 500,
  /** Monte Carlo draws of one uncertainty band */
  monteCarloDraws: 100_000,
  /** rows of one measured profile */
  profileRows: 1_000_000,
} as const;
