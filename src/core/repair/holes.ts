/**
 * Hole making for the repair options: tap drills for ordinary threads, the
 * depths a blind tapped hole needs, clearance holes for a through-bolt and the
 * ligament rule for the wall around the hole. Working units: mm.
 */
import {drillPointLength, type ThreadBasics} from './helical.js';
import {lengthIn} from './common.js';
import type {UnitSystem} from '../units.js';

/**
 * Common tap drills for ISO coarse threads, mm (the values of the ISO 2306 /
 * DIN 336 tables as remembered: from memory).
 */
const COARSE_TAP_DRILLS: Record<string, number> = {
  '3x0.5': 2.5, '4x0.7': 3.3, '5x0.8': 4.2, '6x1': 5, '8x1.25': 6.8, '10x1.5': 8.5, '12x1.75': 10.2,
  '14x2': 12, '16x2': 14, '18x2.5': 15.5, '20x2.5': 17.5, '22x2.5': 19.5, '24x3': 21, '27x3': 24,
  '30x3.5': 26.5, '33x3.5': 29.5, '36x4': 32,
};

/** ISO 273 medium-series clearance holes, mm (from memory). */
const CLEARANCE_MEDIUM: Record<string, number> = {
  '3': 3.4, '4': 4.5, '5': 5.5, '6': 6.6, '8': 9, '10': 11, '12': 13.5, '14': 15.5, '16': 17.5,
  '18': 20, '20': 22, '22': 24, '24': 26, '27': 30, '30': 33, '33': 36, '36': 39,
};

export const HOLE_SOURCES = {
  tapDrill:
    'tap drill: ISO coarse threads from the common ISO 2306 / DIN 336 values (from memory); otherwise D - P rounded to 0.1 mm and kept inside the internal minor-diameter limits (common practice, no source)',
  depth:
    'blind tapped hole: full thread to 1P below the screw tip, plus 4P for the plug-tap chamfer (common practice, no source; the same allowance ASME B18.29.2M uses for plug taps), plus the 118 deg drill point 0.3 x drill (point geometry)',
  clearance: 'clearance hole: ISO 273 medium series (from memory); other sizes 1.1 D rounded up to 0.5 mm (common practice, no source)',
  ligament:
    'ligament: the edge distance less the new thread radius must be at least 0.25 x the new major diameter and 1 mm (common practice, no source)',
} as const;

function key(x: number): string {
  return Number(x.toFixed(3)).toString();
}

/**
 * Tap drill for an ordinary thread, mm. ISO coarse sizes: the common table
 * value (from memory). Otherwise D - P rounded to 0.1 mm (common practice),
 * clamped into the internal thread's minor-diameter limits when they are given.
 */
export function tapDrill(t: ThreadBasics, minorLimits?: {min: number; max: number}): number {
  if (t.family === 'metric') {
    const table = COARSE_TAP_DRILLS[`${key(t.nominal)}x${key(t.pitch)}`];
    if (table !== undefined) return table;
  }
  let drill = Math.round((t.nominal - t.pitch) * 10) / 10;
  if (minorLimits) {
    if (drill < minorLimits.min) drill = Math.ceil(minorLimits.min * 20 - 1e-6) / 20;
    if (drill > minorLimits.max) drill = Math.floor(minorLimits.max * 20 + 1e-6) / 20;
  }
  return drill;
}

/** Clearance hole for a through-bolt, mm: ISO 273 medium (from memory), else 1.1 D up to 0.5 mm. */
export function clearanceHole(t: ThreadBasics): number {
  if (t.family === 'metric') {
    const table = CLEARANCE_MEDIUM[key(t.nominal)];
    if (table !== undefined) return table;
  }
  return Math.ceil(t.nominal * 1.1 * 2 - 1e-6) / 2;
}

export interface BlindHoleDepths {
  /** Full-form thread depth: screw reach + 1P, mm. */
  tappedDepth: number;
  /** Depth to the full drill diameter: tapped depth + 4P plug-tap chamfer, mm. */
  drilledDepth: number;
  /** Drilled depth plus the 118° drill point, mm. */
  holeDepth: number;
}

/**
 * Depths of a blind tapped hole for a screw reaching `reach` mm below the
 * surface (common practice, no source: 1P clearance below the tip, 4P plug-tap
 * chamfer; the 118° point adds 0.300 x drill by its geometry).
 */
export function blindHoleDepths(reach: number, pitch: number, drill: number): BlindHoleDepths {
  const tappedDepth = reach + pitch;
  const drilledDepth = tappedDepth + 4 * pitch;
  return {tappedDepth, drilledDepth, holeDepth: drilledDepth + drillPointLength(drill)};
}

/** Smallest ligament left between a new thread and the nearest edge, mm (common practice, no source). */
export function minimumLigament(newMajor: number): number {
  return Math.max(1, 0.25 * newMajor);
}

/**
 * Wall check: null when the edge distance (centre line to nearest edge, mm)
 * leaves enough ligament around a thread or hole of diameter `newMajor`, else
 * the reason in shop words.
 */
export function wallProblem(wall: number | undefined, newMajor: number, what: string, units?: UnitSystem): string | null {
  if (wall === undefined) return null;
  const ligament = wall - newMajor / 2;
  const needed = minimumLigament(newMajor);
  if (ligament + 1e-9 >= needed) return null;
  const l = (x: number, d?: number) => lengthIn(units, x, d);
  return `${what} (${l(newMajor, 2)}) leaves ${l(Math.max(0, ligament), 2)} of wall to the edge; needs ${l(needed, 2)} (edge distance ${l(wall)})`;
}
