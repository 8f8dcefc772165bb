/**
 * A preset as plain text (for `presets show` and the workbench's preset
 * details): every stored value with its working unit.
 */
import type {Preset} from './schema.js';
import {printable} from '../core/text-safety.js';

const UNIT: Record<string, string> = {
  boltRm: 'MPa',
  boltRp: 'MPa',
  parentRm: 'MPa',
  parentShear: 'MPa',
  nutHeight: 'mm',
  nutFlats: 'mm',
  engagement: 'mm',
  chamfer: 'mm',
  holeDepth: 'mm',
  torque: 'N·m',
  preload: 'N',
  serviceLoad: 'N',
  bearingDiameter: 'mm',
  strippedDepth: 'mm',
  depthAvailable: 'mm',
  wall: 'mm',
  load: 'N',
  collarDiameter: 'mm',
  nutLength: 'mm',
  nutWear: 'mm',
  screwYield: 'MPa',
  length: 'mm',
  speed: 'm/s',
  allowablePressure: 'MPa',
};

function value(key: string, v: unknown): string {
  if (v !== null && typeof v === 'object' && 'min' in v && 'max' in v) {
    const r = v as {min: unknown; max: unknown};
    return printable(r.min === r.max ? String(r.min) : `${r.min}..${r.max}`);
  }
  if (typeof v === 'object' && v !== null) return printable(JSON.stringify(v).slice(0, 60));
  return `${printable(String(v))}${UNIT[key] ? ` ${UNIT[key]}` : ''}`;
}

function block(title: string, obj: Record<string, unknown> | undefined): string[] {
  if (!obj) return [];
  const keys = Object.keys(obj).filter(k => obj[k] !== undefined);
  if (keys.length === 0) return [];
  const w = Math.max(...keys.map(k => k.length));
  return [title, ...keys.map(k => `  ${printable(k).padEnd(w)}  ${value(k, obj[k])}`)];
}

export function describePreset(p: Preset, readOnly: boolean): string {
  const lines = [
    `${printable(p.name)}${readOnly ? '  (shipped demo preset, read-only)' : p.demo ? '  (demo data)' : ''}`,
    `  kind      ${p.kind}`,
    `  saved     ${p.savedAt}, revision ${p.revision}`,
    ...block('joint', p.joint),
    ...block('repair', p.repair as Record<string, unknown> | undefined),
    ...block('power screw', p.screw),
    ...block('notes', p.notes),
  ];
  return `${lines.join('\n')}\n`;
}
