/**
 * The workbench's services wired to the real core, store and report modules.
 * This is the only UI file that touches the file system (through the store and
 * one writeFile for reports).
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import {checkJoint} from '../core/joint/index.js';
import type {JointInput} from '../core/joint/input.js';
import {planRepairs} from '../core/repair/index.js';
import {checkScrew, THREAD_FRICTION, COLLAR_FRICTION, THREAD_FRICTION_SOURCE, COLLAR_FRICTION_SOURCE} from '../core/screw/index.js';
import type {ScrewInput} from '../core/screw/input.js';
import {listBoltGrades, listNutClasses, listParentMaterials} from '../core/materials/index.js';
import {listDesignations, nearestDesignations} from '../core/threads/index.js';
import {formatQuantity, type UnitSystem} from '../core/units.js';
import {formatCheckMarkdown, formatCheckText, planSectionLines, planText, screwMarkdown, screwText, wrapText} from '../report/index.js';
import {screwFlagsInUnits} from '../core/screw/flags.js';
import {defaultSolidTable} from '../store/solid-tables.js';
import {withUserMaterial} from '../store/user-materials.js';
import type {UserParentMaterial} from '../core/joint/input.js';
import type {SolidInsertTable} from '../core/repair/index.js';
import {DEFAULT_PRESET} from '../store/shipped.js';
import {FILES} from '../store/paths.js';
import {readSettingsQuick} from '../store/settings-schema.js';
import {clearDraft, loadDraft, saveDraft} from '../store/draft.js';
import {openPresetStore, type Preset, type PresetStore} from '../store/presets.js';
import type {Draft, PickItem, WorkbenchServices} from './services.js';
import {sizeRangeWords} from '../core/inch-drills.js';
import type {FormValues, PickSource} from './state/fields.js';
import {windowPicks} from './window-picks.js';
import {tighteningOutlook} from '../app/tightening.js';
import {outlookMarkdown, outlookText} from '../report/outlook-sections.js';
import type {CheckResult} from '../core/joint/result.js';

export function presetValues(p: Preset): FormValues {
  const v = {joint: structuredClone(p.joint ?? {thread: 'M10', engagement: 10}), hole: structuredClone(p.repair ?? {})} as FormValues;
  if (p.screw) v.screw = structuredClone(p.screw);
  v.notes = structuredClone(p.notes ?? {});
  if (p.chosenRepair) (v as FormValues & {chosenRepair?: unknown}).chosenRepair = structuredClone(p.chosenRepair);
  return v;
}


/** "1/4 in < d <= 3/4 in: " or "" (the size range of a grade or class row, in the display units). */
const sizeText = (r: {sizeMinMm?: number; sizeMaxMm?: number}, units: UnitSystem): string => {
  const w = sizeRangeWords(r, units);
  return w === '' ? '' : `${w}: `;
};

/** The tightening window and sensitivity list as a report section (none when the outlook cannot be computed). */
function outlookSection(format: 'text' | 'markdown', result: CheckResult, input: JointInput, units: UnitSystem): string[] {
  try {
    const o = tighteningOutlook(input, result);
    return [format === 'text' ? outlookText(o, {units, ascii: false}) : outlookMarkdown(o, {units, ascii: false})];
  } catch {
    return [];
  }
}

function picks(source: PickSource, units: UnitSystem): PickItem[] {
  const windowItems = windowPicks(source);
  if (windowItems) return windowItems;
  const s = (v: number) => formatQuantity(v, 'stress', units, {significant: 3});
  const group = <T extends {id: string; name: string; provenance: PickItem['provenance']}>(rows: T[], detail: (r: T) => string): PickItem[] => {
    const ids = [...new Set(rows.map(r => r.id))];
    return ids.map(id => {
      const mine = rows.filter(r => r.id === id);
      const first = mine[0]!;
      return {id, name: first.name, detail: mine.map(detail).join('; '), provenance: first.provenance};
    });
  };
  // Friction of power screws: the rows of the published tables; the entry sets the number field.
  if (source === 'screwThreadFriction') {
    return THREAD_FRICTION.map(p => ({
      id: p.id,
      name: `${p.screw} screw, ${p.nut} nut`,
      detail: `f ${p.min.toFixed(2)} to ${p.max.toFixed(2)}`,
      provenance: THREAD_FRICTION_SOURCE,
      value: {min: p.min, max: p.max},
    }));
  }
  if (source === 'screwCollarFriction') {
    return COLLAR_FRICTION.flatMap(p => [
      {id: p.id, name: `${p.combination}, running`, detail: `fc ${p.running.toFixed(2)}`, provenance: COLLAR_FRICTION_SOURCE, value: p.running},
      {id: `${p.id}:starting`, name: `${p.combination}, starting`, detail: `fc ${p.starting.toFixed(2)}`, provenance: COLLAR_FRICTION_SOURCE, value: p.starting},
    ]);
  }
  if (source === 'boltGrade') return group(listBoltGrades(), g => `${sizeText(g, units)}Rm ${s(g.rmMin)}, Rp0.2 ${s(g.rpMin)}`);
  if (source === 'nutClass') return group(listNutClasses(), n => `${sizeText(n, units)}Rm ${s(n.rm)}`);
  return group(listParentMaterials(), m => `Rm ${s(m.rm)}, yield ${s(m.yield)}, shear ${s(m.shear)}`);
}

/** The user's own parent materials as picker entries, with their source. */
function userPicks(materials: readonly UserParentMaterial[], units: UnitSystem): PickItem[] {
  const s = (v: number) => formatQuantity(v, 'stress', units, {significant: 3});
  return materials.map(m => ({
    id: m.id,
    name: `${m.name} (yours)`,
    detail: `Rm ${s(m.rm)}, yield ${s(m.yield)}, shear ${s(m.shear)}`,
    provenance: {source: m.source, kind: 'user' as const},
  }));
}

/** Type-ahead: designations starting with the text first, then the nearest by spelling. */
function designations(query: string, limit: number): string[] {
  const q = query.trim().toLowerCase().replace(/\s+/g, ' ');
  if (q === '') return [];
  const all = listDesignations().filter(d => !/^tr|acme/i.test(d));
  const starts = all.filter(d => d.toLowerCase().startsWith(q));
  const out = starts.slice(0, limit);
  if (out.length < limit) for (const d of nearestDesignations(query, limit)) if (!out.includes(d) && out.length < limit) out.push(d);
  return out;
}

/** A typed path as a full path: "~" and "~/x" from the home folder, a relative path from `cwd`. */
export function expandPath(typed: string, cwd: string, home: string = os.homedir()): string {
  const p = typed.trim();
  if (p === '~') return home;
  if (p.startsWith('~/')) return path.join(home, p.slice(2));
  return path.resolve(cwd, p);
}

export function realServices(opts: {configDir: string; cwd: string; now: () => Date; store?: PresetStore}): WorkbenchServices & {store: PresetStore} {
  const resolvePath = (p: string) => expandPath(p, opts.cwd);
  const store = opts.store ?? openPresetStore(opts.configDir);
  const loaded = new Map<string, {revision: number; notes: Preset['notes']}>();
  const getPreset = (name: string): Preset => {
    const p = store.get(name);
    if (!p) throw new Error(`no preset named "${name}"`);
    return p;
  };
  // The user's materials and insert table come from the store file. The readout
  // asks for them on every keystroke, so they are read again only when the file
  // changed (size or time), not parsed on each key.
  let cached: {key: string; materials: UserParentMaterial[]; solidTable: SolidInsertTable} | undefined;
  const mine = () => {
    let key = 'none';
    try {
      const st = fs.statSync(store.file);
      key = `${st.mtimeMs}:${st.size}`;
    } catch {
      // No store file yet: no materials of the user's own.
    }
    if (cached?.key !== key) cached = {key, materials: store.userMaterials(), solidTable: defaultSolidTable(store)};
    return cached;
  };
  // The settings file, read again only when it changed (the readout asks on every keystroke).
  let settingsCache: {key: string; scatterDefault: number} | undefined;
  const settings = () => {
    let key = 'none';
    try {
      const st = fs.statSync(path.join(opts.configDir, FILES.settings));
      key = `${st.mtimeMs}:${st.size}`;
    } catch {
      // No settings file: the defaults.
    }
    if (settingsCache?.key !== key) settingsCache = {key, scatterDefault: readSettingsQuick(opts.configDir).scatterDefault};
    return {scatterDefault: settingsCache.scatterDefault};
  };
  return {
    store,
    settings,
    userMaterials: () => mine().materials,
    // The user's own parent materials from the store count as well as the library's.
    check: (input: JointInput) => checkJoint(withUserMaterial(input, mine().materials)),
    checkScrew: (input: ScrewInput) => checkScrew(input),
    designations,
    picks: (source, units) => [...picks(source, units), ...(source === 'parent' ? userPicks(mine().materials, units) : [])],
    // The user's first stored solid-insert table, else the shipped demo table (as tapwright repair).
    repairs: (joint, hole, units) => planRepairs(withUserMaterial(joint, mine().materials), hole, mine().solidTable, units ?? 'si'),
    presets: {
      list: () =>
        store.list().map(p => ({
          name: p.name,
          readOnly: p.readOnly,
          savedAt: p.source === 'saved' ? p.savedAt : undefined,
          thread: p.thread,
          kind: p.kind,
          notes: [p.asset, p.location, p.workOrder].filter(Boolean).join(' '),
        })),
      load(name) {
        const p = getPreset(name);
        const readOnly = store.list().find(s => s.name === p.name)?.readOnly ?? false;
        loaded.set(p.name, {revision: p.revision, notes: p.notes});
        return {name: p.name, readOnly, kind: p.kind, values: presetValues(p), notes: p.notes.text};
      },
      save(name, values, {overwrite, kind = 'joint'}) {
        const before = loaded.get(name);
        const existing = overwrite ? store.get(name) : undefined;
        const saved = store.save(
          {
            name,
            kind,
            ...(kind === 'joint' || values.joint.thread ? {joint: values.joint as JointInput, repair: values.hole} : {}),
            ...(values.screw ? {screw: values.screw as ScrewInput} : {}),
            // The workbench's notes; a draft from before notes were edited has none: keep the stored ones.
            notes: values.notes ?? existing?.notes ?? before?.notes ?? {},
            ...((values as {chosenRepair?: Preset['chosenRepair']}).chosenRepair ? {chosenRepair: (values as {chosenRepair?: Preset['chosenRepair']}).chosenRepair} : {}),
          },
          {overwrite, ...(before && overwrite ? {expectedRevision: before.revision} : {})},
        );
        loaded.set(saved.name, {revision: saved.revision, notes: saved.notes});
      },
      rename: (from, to) => store.rename(from, to),
      duplicate: (from, to) => {
        store.duplicate(from, to);
      },
      remove: name => store.remove(name),
      importFile(file) {
        const r = store.importFile(path.resolve(opts.cwd, file));
        return {imported: [...r.added, ...r.replaced], skipped: r.skipped.map(x => `${x.name}: ${x.reason}`)};
      },
      exportFile: (file, name, overwrite) => store.exportTo(path.resolve(opts.cwd, file), name ? [name] : undefined, {force: overwrite}),
    },
    draft: {
      load: () => {
        const d = loadDraft<Draft>(opts.configDir);
        return d && typeof d.savedAt === 'string' && d.values && typeof d.values === 'object' ? d : undefined;
      },
      save: d => saveDraft(opts.configDir, d),
      clear: () => clearDraft(opts.configDir),
    },
    report(format, result, input, meta) {
      const rep = meta.repairs;
      // The hole as recorded (stripped or intact) among the inputs, as check --preset reports it.
      const hole = rep ? {hole: {state: rep.plan.hole.state, strippedDepth: rep.plan.hole.strippedDepth}} : {};
      const notes = meta.notes ?? loaded.get(meta.presetName)?.notes;
      if (format === 'text') {
        const extra = rep ? [planText(rep.plan, meta.units, 'REPAIR PLAN (ranked)', {cautions: false, ...(rep.chosen !== undefined ? {chosen: rep.chosen} : {})}), ...(rep.chosenNote ? [wrapText(rep.chosenNote, '', '  ').join('\n')] : [])] : [];
        return formatCheckText(result, input, {units: meta.units, extraSections: [...outlookSection('text', result, input, meta.units), ...extra], presetName: meta.presetName, date: meta.date, ...hole, ...(notes ? {notes} : {})});
      }
      const extra = rep
        ? [['## Repair plan', '', ...(rep.chosenNote ? [`**${rep.chosenNote}**`, ''] : []), ...planSectionLines(rep.plan, meta.units, {level: 3, ...(rep.chosen !== undefined ? {chosen: rep.chosen} : {})})].join('\n')]
        : [];
      return formatCheckMarkdown(result, input, {presetName: meta.presetName, date: meta.date, units: meta.units, extraSections: [...outlookSection('markdown', result, input, meta.units), ...extra], ...hole, ...(notes ? {notes} : {})});
    },
    screwReport(format, result, input, meta) {
      const notes = meta.notes ?? loaded.get(meta.presetName)?.notes;
      const m = {presetName: meta.presetName, date: meta.date, duty: input.duty, ...(notes ? {notes} : {})};
      const flags = screwFlagsInUnits(result, input, meta.units);
      return format === 'markdown' ? screwMarkdown(result, input, {...m, units: meta.units}, flags) : screwText(result, meta.units, meta.presetName, m, flags);
    },
    writeFile(file, text, overwrite) {
      const full = resolvePath(file);
      try {
        fs.writeFileSync(full, text, {flag: overwrite ? 'w' : 'wx'});
      } catch (e) {
        // The error keeps its code: the workbench decides by the code, never by the words.
        const code = (e as NodeJS.ErrnoException).code;
        const coded = (message: string) => Object.assign(new Error(message), {code});
        if (code === 'EEXIST') throw coded(`${full} exists`);
        if (code === 'ENOENT') throw coded(`folder ${path.dirname(full)} does not exist`);
        if (code === 'ENOTDIR') throw coded(`${path.dirname(full)} is not a folder`);
        if (code === 'EISDIR') throw coded(`${full} is a folder; give a file name`);
        if (code === 'EACCES' || code === 'EPERM') throw coded(`no permission to write ${full}`);
        throw e;
      }
    },
    resolvePath,
    cwd: opts.cwd,
    defaultPreset: DEFAULT_PRESET,
    now: opts.now,
  };
}
