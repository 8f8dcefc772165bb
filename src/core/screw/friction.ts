/**
 * Friction picks for the power-screw inputs, as data for the workbench pickers and
 * the CLI. Values are those of Shigley's Mechanical Engineering Design, 9th ed.
 * (Budynas & Nisbett), Table 8-5 (thread pairs) and Table 8-6 (thrust collars),
 * which quote H. A. Rothbart and T. H. Brown, Jr., Mechanical Design Handbook,
 * 2nd ed., McGraw-Hill, 2006. Dimensionless coefficients.
 */
import type {Provenance} from '../types.js';

export const THREAD_FRICTION_SOURCE: Provenance = {
  source: "Shigley's Mechanical Engineering Design, 9th ed., Table 8-5 (after Rothbart & Brown, Mechanical Design Handbook, 2nd ed., 2006)",
  kind: 'book',
};

export const COLLAR_FRICTION_SOURCE: Provenance = {
  source: "Shigley's Mechanical Engineering Design, 9th ed., Table 8-6 (after Rothbart & Brown, Mechanical Design Handbook, 2nd ed., 2006)",
  kind: 'book',
};

export interface ThreadFrictionPick {
  /** Pick id used by the CLI and presets: "<screw>/<nut>". */
  id: string;
  screw: string;
  nut: string;
  min: number;
  max: number;
}

export interface CollarFrictionPick {
  id: string;
  combination: string;
  running: number;
  starting: number;
}

function t(screwId: string, screw: string, nut: string, min: number, max: number): ThreadFrictionPick {
  return {id: `${screwId}/${nut.replace(' ', '-')}`, screw, nut, min, max};
}

/** Thread friction f for screw and nut material pairs (Shigley 9th ed. Table 8-5). */
export const THREAD_FRICTION: readonly ThreadFrictionPick[] = [
  t('steel-dry', 'steel, dry', 'steel', 0.15, 0.25),
  t('steel-dry', 'steel, dry', 'bronze', 0.15, 0.23),
  t('steel-dry', 'steel, dry', 'brass', 0.15, 0.19),
  t('steel-dry', 'steel, dry', 'cast iron', 0.15, 0.25),
  t('steel-oil', 'steel, machine oil', 'steel', 0.11, 0.17),
  t('steel-oil', 'steel, machine oil', 'bronze', 0.1, 0.16),
  t('steel-oil', 'steel, machine oil', 'brass', 0.1, 0.15),
  t('steel-oil', 'steel, machine oil', 'cast iron', 0.11, 0.17),
  t('bronze', 'bronze', 'steel', 0.08, 0.12),
  t('bronze', 'bronze', 'bronze', 0.04, 0.06),
  t('bronze', 'bronze', 'cast iron', 0.06, 0.09),
];

/** Thrust-collar friction fc (Shigley 9th ed. Table 8-6). */
export const COLLAR_FRICTION: readonly CollarFrictionPick[] = [
  {id: 'soft-steel/cast-iron', combination: 'soft steel on cast iron', running: 0.12, starting: 0.17},
  {id: 'hard-steel/cast-iron', combination: 'hard steel on cast iron', running: 0.09, starting: 0.15},
  {id: 'soft-steel/bronze', combination: 'soft steel on bronze', running: 0.08, starting: 0.1},
  {id: 'hard-steel/bronze', combination: 'hard steel on bronze', running: 0.06, starting: 0.08},
];

/** The Table 8-5 pick with this id ("steel-oil/bronze"), or undefined. Dimensionless. */
export function threadFrictionPick(id: string): ThreadFrictionPick | undefined {
  const key = id.trim().toLowerCase().replace(/\s+/g, '-');
  return THREAD_FRICTION.find(p => p.id === key);
}

/** The Table 8-6 pick with this id ("hard-steel/bronze"), or undefined. Dimensionless. */
export function collarFrictionPick(id: string): CollarFrictionPick | undefined {
  const key = id.trim().toLowerCase().replace(/\s+/g, '-');
  return COLLAR_FRICTION.find(p => p.id === key);
}
