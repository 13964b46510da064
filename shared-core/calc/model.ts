import type { JetTrajectory } from '../jets/buoyant-jet';
import type { DiffuserPlume } from '../jets/diffuser';

/**
 * The typed model result of an estimate, beside its scalar results: what the section drawing, the
 * compliance table and the report read instead of re-running the model. Plain data (it crosses to the
 * workspace's worker by structured clone).
 */
export type EstimateModel =
  | { kind: 'jet'; trajectory: JetTrajectory }
  | { kind: 'diffuser'; diffuser: DiffuserPlume }
  | { kind: 'withdrawal-zones'; zones: WithdrawalZone[] }
  | { kind: 'withdrawal-layer'; portDepth: number; top: number; bottom: number };

/** One withdrawal zone of a release: the depths it draws from and what it is (a port, a group of ports). */
export interface WithdrawalZone {
  label: string;
  /** index of the port (or the first port of a group) in the intake's port list */
  port: number;
  top: number;
  bottom: number;
}
