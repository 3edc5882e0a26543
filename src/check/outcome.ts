/** The part of a verdict the checker decides (the rest — file, line, name, time — is added around it). */
import type { Verdict } from '../verdict/index.js';

export type Outcome = Pick<
  Verdict,
  'verdict' | 'type' | 'leftType' | 'rightType' | 'compared' | 'bound' | 'mismatch' | 'route' | 'reason' | 'normalForm' | 'diagnostics' | 'evidence'
>;
