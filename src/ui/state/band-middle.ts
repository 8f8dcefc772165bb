/**
 * The `b` key on the Tightening step: set the torque to the middle of the tightening window's
 * band (src/app/tightening.ts) and tighten by torque. Pure: returns the new state.
 */
import {formatQuantity} from '../../core/units.js';
import type {WorkbenchServices} from '../services.js';
import {evaluate} from './evaluate.js';
import {stepsFor} from './fields.js';
import {evaluateOutlook} from './outlook.js';
import {fail, info, shownValues, type Values, type WorkbenchState} from './workbench.js';

export function bandMiddle(s: WorkbenchState, svc: WorkbenchServices): WorkbenchState {
  if (s.mode !== 'joint' || stepsFor(s.mode)[s.step]?.id !== 'tightening') return {...s, message: info('b sets the torque to the middle of the band: go to the Tightening step')};
  const o = evaluateOutlook(evaluate(shownValues(s), svc, s.units, s.ascii), s.units);
  const w = o.outlook?.window;
  if (!w?.torque) return {...s, message: fail(o.error ?? 'No tightening band for this joint: see the picture for the two limits that cross')};
  const middle = Number(w.torque.middle.toPrecision(4));
  const values: Values = {...s.values, joint: {...s.values.joint, tightening: 'torque', torque: middle}};
  const q = (x: number) => formatQuantity(x, 'torque', s.units, {ascii: s.ascii});
  const wrench = w.wrench ? `; wrench ${q(middle + w.wrench.prevailing)} (+ prevailing)` : '';
  return {...s, values, message: info(`Torque set to the band's middle: ${q(middle)}${wrench}`)};
}
