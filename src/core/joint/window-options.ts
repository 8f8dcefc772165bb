/**
 * The inputs the tightening window adds to a joint, validated in one place: a fastener
 * lubricant pick, a prevailing-torque locking element or a prevailing torque, the least clamp
 * load and the wrench accuracy. Bad input gives a message naming the option and what it takes.
 * Units: N·m, N, fraction. Sources: friction picks VDI 2230 Part 1 friction classes
 * (friction-picks.ts); prevailing torques ISO 2320:2008 (locking.ts); wrench accuracy ISO 6789.
 */
import * as z from 'zod';
import {FASTENER_FRICTION, fastenerFrictionPick, frictionFromPick} from './friction-picks.js';
import {LOCKING_ELEMENTS, ISO_2320_PREVAILING, lockingElement, prevailingTorque, type LockingElement} from './locking.js';
import type {Provenance} from '../types.js';

export const WindowInputSchema = z.object({
  /** Fastener lubricant/coating pick id (FASTENER_FRICTION); sets muThread and muHead. */
  lubricant: z.enum(FASTENER_FRICTION.map(p => p.id) as [string, ...string[]]).optional(),
  /** Prevailing-torque locking element; its ISO 2320 torque for the thread size is added on the wrench. */
  locking: z.enum(LOCKING_ELEMENTS.map(e => e.id) as [LockingElement, ...LockingElement[]]).optional(),
  /** Prevailing torque given directly, N·m (overrides the element's table value). */
  prevailingTorque: z.number().min(0).max(5000).optional(),
  /** Least clamp load the service needs at assembly, N. */
  leastClamp: z.number().min(0).max(1e8).optional(),
  /** Wrench permissible deviation, fraction (0.04 = +-4 %). */
  wrenchAccuracy: z.number().min(0.005).max(0.5).optional(),
});

export type WindowInput = z.output<typeof WindowInputSchema>;

/** A problem with one of the window's options: the option's CLI name and the message. */
export interface WindowOptionProblem {
  option: '--lubricant' | '--locking' | '--prevailing-torque' | '--least-clamp' | '--wrench-accuracy';
  message: string;
}

/** Check a lubricant id; undefined when good, else the message with the accepted ids. */
export function lubricantProblem(id: string): WindowOptionProblem | undefined {
  if (fastenerFrictionPick(id)) return undefined;
  return {option: '--lubricant', message: `unknown lubricant "${id}" (accepted: ${FASTENER_FRICTION.map(p => p.id).join(', ')})`};
}

/** Check a locking element id; undefined when good, else the message with the accepted ids. */
export function lockingProblem(id: string): WindowOptionProblem | undefined {
  if (lockingElement(id)) return undefined;
  return {option: '--locking', message: `unknown locking element "${id}" (accepted: ${LOCKING_ELEMENTS.map(e => e.id).join(', ')})`};
}

/** Check a number against a schema bound; the message names the option and the accepted range. */
export function numberProblem(option: WindowOptionProblem['option'], value: number, min: number, max: number, unit: string): WindowOptionProblem | undefined {
  if (Number.isFinite(value) && value >= min && value <= max) return undefined;
  return {option, message: `${option} must be a number from ${min} to ${max}${unit ? ` ${unit}` : ''}`};
}

export interface ResolvedWindowInput {
  friction?: {muThread: {min: number; max: number}; muHead: {min: number; max: number}; provenance: Provenance};
  /** Prevailing torque to add on the wrench, N·m, and where it came from. */
  prevailing?: {torque: number; provenance: Provenance};
  leastClamp?: number;
  wrenchAccuracy?: number;
}

/**
 * Turn validated window inputs into numbers for a thread of nominal diameter d (mm). A locking
 * element on a size ISO 2320 does not list (inch threads, odd sizes) without a prevailing torque
 * is a problem naming --prevailing-torque. Returns the numbers or the problem.
 */
export function resolveWindowInput(w: WindowInput, nominalMm: number): {ok: true; value: ResolvedWindowInput} | {ok: false; problem: WindowOptionProblem} {
  const out: ResolvedWindowInput = {};
  if (w.lubricant !== undefined) {
    const p = fastenerFrictionPick(w.lubricant);
    if (!p) return {ok: false, problem: lubricantProblem(w.lubricant)!};
    out.friction = {...frictionFromPick(p), provenance: p.provenance};
  }
  if (w.prevailingTorque !== undefined) {
    out.prevailing = {torque: w.prevailingTorque, provenance: {source: 'prevailing torque given by the user', kind: 'user'}};
  } else if (w.locking !== undefined) {
    const t = prevailingTorque(w.locking, nominalMm);
    if (!t) {
      const sizes = ISO_2320_PREVAILING.map(r => `M${r.d}`).join(', ');
      return {ok: false, problem: {option: '--prevailing-torque', message: `ISO 2320 lists no prevailing torque for a ${nominalMm.toFixed(2)} mm thread (metric ${sizes}): give --prevailing-torque`}};
    }
    out.prevailing = {torque: t.torque, provenance: t.provenance};
  }
  if (w.leastClamp !== undefined) out.leastClamp = w.leastClamp;
  if (w.wrenchAccuracy !== undefined) out.wrenchAccuracy = w.wrenchAccuracy;
  return {ok: true, value: out};
}
