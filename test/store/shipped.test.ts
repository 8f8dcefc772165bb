/**
 * The shipped demo presets: invented scenarios, marked demo, valid against the
 * current schemas, and using materials that exist in the material library.
 */
import {describe, expect, it} from 'vitest';
import fs from 'node:fs';
import path from 'node:path';
import {DEFAULT_PRESET, shippedPresets, shippedProblems} from '../../src/store/shipped.js';
import {PresetSchema} from '../../src/store/schema.js';
import {boltGradeIds, listNutClasses, listParentMaterials} from '../../src/core/materials/index.js';
import {nutMaterial, screwMaterial} from '../../src/core/screw/materials.js';
import {checkJoint} from '../../src/core/joint/index.js';
import {checkScrew} from '../../src/core/screw/index.js';
import {planRepairs} from '../../src/core/repair/index.js';

const dir = path.resolve(path.dirname(new URL(import.meta.url).pathname), '..', '..', 'presets');
const files = fs.readdirSync(dir).filter(f => f.endsWith('.json') && f.startsWith('demo-'));

describe('shipped presets', () => {
  it('every presets/demo-*.json is embedded, and all parse against the current schemas', () => {
    expect(shippedProblems()).toEqual([]);
    expect(files.length).toBeGreaterThanOrEqual(3);
    expect(shippedPresets().map(p => `${p.name}.json`).sort()).toEqual([...files].sort());
    for (const f of files) {
      const raw = JSON.parse(fs.readFileSync(path.join(dir, f), 'utf8'));
      expect(PresetSchema.safeParse(raw).success, f).toBe(true);
    }
  });

  it('are all marked demo, in the name, the notes and the demo field', () => {
    for (const p of shippedPresets()) {
      expect(p.demo).toBe(true);
      expect(p.name).toMatch(/^demo-/);
      expect(p.notes.text).toMatch(/Demo scenario, invented/);
      expect(p.notes.asset).toMatch(/DEMO/);
      expect(p.notes.workOrder).toMatch(/DEMO/);
    }
  });

  it('the default preset exists and is a joint', () => {
    expect(shippedPresets().find(p => p.name === DEFAULT_PRESET)?.kind).toBe('joint');
  });

  it('cover joints (tapped and nut), an inch thread and a power screw', () => {
    const ps = shippedPresets();
    expect(ps.some(p => p.joint?.internal === 'tapped')).toBe(true);
    expect(ps.some(p => p.joint?.internal === 'nut')).toBe(true);
    expect(ps.some(p => /UNC|UNF/.test(p.joint?.thread ?? ''))).toBe(true);
    expect(ps.some(p => p.kind === 'screw')).toBe(true);
    expect(ps.some(p => p.repair !== undefined)).toBe(true);
  });

  it('use bolt grades, nut classes and parent materials that exist in the material library', () => {
    const grades = boltGradeIds().map(s => s.toUpperCase());
    const nuts = listNutClasses().map(n => n.id.toUpperCase());
    const parents = listParentMaterials().map(m => m.id.toUpperCase());
    for (const p of shippedPresets()) {
      if (p.joint) {
        expect(grades, `${p.name} boltGrade`).toContain(p.joint.boltGrade.toUpperCase());
        if (p.joint.parent) expect(parents, `${p.name} parent`).toContain(p.joint.parent.toUpperCase());
        if (p.joint.nutClass) expect(nuts, `${p.name} nutClass`).toContain(p.joint.nutClass.toUpperCase());
        if (p.joint.internal === 'tapped') expect(p.joint.parent, `${p.name} needs a parent material`).toBeDefined();
      }
      if (p.screw) {
        expect(nutMaterial(p.screw.nutMaterial), `${p.name} nutMaterial`).toBeDefined();
        if (p.screw.screwMaterial) expect(screwMaterial(p.screw.screwMaterial), `${p.name} screwMaterial`).toBeDefined();
      }
    }
  });

  it('compute without an input error through the core (joint check, repair plan, power screw)', () => {
    for (const p of shippedPresets()) {
      if (p.joint) expect(() => checkJoint(p.joint!), p.name).not.toThrow();
      if (p.joint && p.repair) expect(() => planRepairs(p.joint!, p.repair!), p.name).not.toThrow();
      if (p.screw) expect(() => checkScrew(p.screw!), p.name).not.toThrow();
    }
  });
});
