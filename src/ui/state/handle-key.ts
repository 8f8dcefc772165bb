/** One key to one command (looked up in the keymap table), and what each command does. */
import type {KeyEvent} from '../keys.js';
import type {WorkbenchServices} from '../services.js';
import {lookup} from '../keymap.js';
import {bodyHeight} from '../layout.js';
import {wrapLines} from '../screens/scroll-view.js';
import {helpLines} from '../screens/help-screen.js';
import {STEPS, fieldById, setValue, type Mode} from './fields.js';
import {evaluate, evaluateRepairs} from './evaluate.js';
import {commitEdit, go, moveField, moveStep, startEdit, startTablePick, withEditPreview, withPickerPreview} from './edit-commands.js';
import {cancelNotes, setNoteBuffer, startNotes} from './note-commands.js';
import {defaultReportPath, loadPreset, markedPreset, reportText, runPrompt, savePreset, slug, writeReport} from './preset-commands.js';
import {contextsOf, currentField, errText, fail, filteredPresets, info, pickerItems, shownValues, snapshot, type WorkbenchState} from './workbench.js';

/** Apply one key to the state. */
export function handleKey(s0: WorkbenchState, ev: KeyEvent, svc: WorkbenchServices): WorkbenchState {
  const s = s0;
  const command = lookup(ev, contextsOf(s));
  if (!command) return s;
  const f = currentField(s);
  switch (command) {
    case 'app.interrupt':
      return {...s, quit: 'interrupt'};
    case 'app.quit':
      return {...s, quit: 'quit'};
    case 'go.joint':
      return go(s, 'joint');
    case 'go.repairs':
      return go(s, 'repairs');
    case 'go.presets':
      return go(s, 'presets');
    case 'go.report':
      return go(s, 'report');
    case 'go.help':
      return {...go(s, 'help'), helpScroll: 0};
    case 'screen.back':
      return {...s, screen: s.screen === 'help' ? s.backTo : 'joint', message: undefined};
    case 'units.toggle': {
      const units = s.units === 'si' ? 'us' : 'si';
      return {...s, units, message: info(units === 'si' ? 'Units: SI (mm, kN, N·m, MPa)' : 'Units: US customary (in, lbf, ft·lbf, ksi)')};
    }
    case 'field.prev':
      return moveField(s, -1);
    case 'field.next':
      return moveField(s, 1);
    case 'step.next':
      return moveStep(s, 1);
    case 'step.prev':
      return moveStep(s, -1);
    case 'field.edit':
      return f ? startEdit(s, f, svc) : s;
    case 'field.table':
      return f ? startTablePick(s, f, svc) : s;
    case 'field.type':
      return f && (f.kind === 'quantity' || f.kind === 'ratio' || f.kind === 'range') ? startEdit(s, f, svc, ev.char) : s;
    case 'field.clear':
      if (!f) return s;
      if (!f.optional) return {...s, message: fail(`${f.label} cannot be empty; Enter to edit it`)};
      return {...s, values: setValue(s.values, f.id, undefined), message: info(`${f.label}: emptied, the default applies`)};
    case 'mode.toggle': {
      if (!svc.checkScrew) return {...s, message: fail('The power-screw mode is not in this build; use tapwright screw')};
      const mode: Mode = s.mode === 'joint' ? 'screw' : 'joint';
      const values = mode === 'screw' && !s.values.screw ? {...s.values, screw: {thread: 'Tr24x5', load: 10000, nutLength: 24}} : s.values;
      return {
        ...s,
        mode,
        values,
        step: 0,
        field: 0,
        message: info(mode === 'screw' ? 'Power-screw mode: lead screw and nut (m: back to the joint)' : 'Joint mode: bolt or screw in a tapped hole or nut'),
      };
    }
    case 'panel.flags':
      return {...s, showFlags: !s.showFlags};
    case 'preset.save':
      if (s.preset.readOnly) {
        return {...s, prompt: {kind: 'saveAs', title: `"${s.preset.name}" is a shipped demo; save as`, buffer: `${s.preset.name} copy`}};
      }
      return savePreset(s, svc, s.preset.name, true);

    case 'edit.commit':
      return commitEdit(s);
    case 'edit.cancel':
      return {...s, edit: undefined, preview: undefined, message: info('Kept the old value')};
    case 'edit.erase':
      return withEditPreview({...s, edit: {...s.edit!, buffer: Array.from(s.edit!.buffer).slice(0, -1).join('')}});
    case 'edit.clear':
      return withEditPreview({...s, edit: {...s.edit!, buffer: ''}});
    case 'edit.commitPrev':
    case 'edit.commitNext': {
      const c = commitEdit(s);
      return c.edit ? c : moveField(c, command === 'edit.commitPrev' ? -1 : 1);
    }
    case 'edit.insert':
      if (s.edit!.buffer.length >= 60) return s;
      return withEditPreview({...s, edit: {...s.edit!, buffer: s.edit!.buffer + (ev.char ?? '')}});

    case 'pick.up':
    case 'pick.down': {
      const n = pickerItems(s, svc).length;
      const lo = fieldById(s.picker!.fieldId).kind === 'thread' ? -1 : 0;
      const index = Math.max(lo, Math.min(n - 1, s.picker!.index + (command === 'pick.up' ? -1 : 1)));
      return withPickerPreview({...s, picker: {...s.picker!, index}}, svc);
    }
    case 'pick.type':
    case 'pick.erase':
    case 'pick.clear': {
      const p = s.picker!;
      const filter = command === 'pick.type' ? p.filter + (ev.char ?? '') : command === 'pick.clear' ? '' : Array.from(p.filter).slice(0, -1).join('');
      const isThread = fieldById(p.fieldId).kind === 'thread';
      return withPickerPreview({...s, picker: {...p, filter: filter.slice(0, 60), index: isThread ? -1 : 0}}, svc);
    }
    case 'pick.take': {
      const p = s.picker!;
      const field = fieldById(p.fieldId);
      const items = pickerItems(s, svc);
      const marked = p.index >= 0 ? items[p.index] : undefined;
      const value = marked ? (marked.item?.value ?? marked.value) : p.filter.trim();
      if (value === undefined || value === '') return {...s, message: fail(`${field.label}: nothing matches "${p.filter}"; Backspace to widen, Esc to keep the old value`)};
      return {...s, values: setValue(s.values, field.id, value), picker: undefined, preview: undefined, message: undefined};
    }
    case 'pick.cancel':
      return {...s, picker: undefined, preview: undefined, message: info('Kept the old value')};

    case 'list.up':
    case 'list.down': {
      const d = command === 'list.up' ? -1 : 1;
      if (s.screen === 'repairs') {
        const n = evaluateRepairs(shownValues(s), svc, evaluate(shownValues(s), svc, s.units, s.ascii), s.units).plan?.options.length ?? 0;
        return {...s, repairIndex: Math.max(0, Math.min(n - 1, s.repairIndex + d))};
      }
      const n = filteredPresets(s, svc).length;
      return {...s, presetList: {...s.presetList, index: Math.max(0, Math.min(n - 1, s.presetList.index + d))}};
    }
    case 'preset.load': {
      const name = markedPreset(s, svc);
      return name ? loadPreset(s, svc, name) : {...s, message: fail('No preset marked; clear the search with / then Enter')};
    }
    case 'preset.search':
      return {...s, prompt: {kind: 'search', title: 'Search presets', buffer: s.presetList.query}};
    case 'preset.saveAs':
      return {...s, prompt: {kind: 'saveAs', title: 'Save the joint as', buffer: ''}};
    case 'preset.rename':
    case 'preset.duplicate':
    case 'preset.export':
    case 'preset.delete': {
      const name = markedPreset(s, svc);
      if (!name) return {...s, message: fail('No preset marked')};
      if (command === 'preset.delete') return {...s, confirm: {kind: 'delete', question: `Delete preset "${name}"? This cannot be undone.`, target: name}};
      if (command === 'preset.rename') return {...s, prompt: {kind: 'rename', title: `Rename "${name}" to`, buffer: name, target: name}};
      if (command === 'preset.duplicate') return {...s, prompt: {kind: 'duplicate', title: `Copy "${name}" as`, buffer: `${name} copy`, target: name}};
      return {...s, prompt: {kind: 'export', title: `Export "${name}" to file`, buffer: `${slug(name)}.json`, target: name}};
    }
    case 'preset.exportAll':
      return {...s, prompt: {kind: 'export', title: 'Export all saved presets to file', buffer: 'tapwright-presets.json'}};
    case 'preset.import':
      return {...s, prompt: {kind: 'import', title: 'Import presets from file', buffer: ''}};

    case 'scroll.up':
    case 'scroll.down':
    case 'scroll.pageUp':
    case 'scroll.pageDown': {
      const page = Math.max(1, s.size.rows - 6);
      const d = {'scroll.up': -1, 'scroll.down': 1, 'scroll.pageUp': -page, 'scroll.pageDown': page}[command];
      const rows = bodyHeight(s.size) - 1;
      const clamp = (x: number, lines: string[]) => Math.max(0, Math.min(x, wrapLines(lines, s.size.columns).length - rows));
      if (s.screen === 'help') {
        const ev = evaluate(shownValues(s), svc, s.units, s.ascii);
        const rule = evaluateRepairs(shownValues(s), svc, ev, s.units).plan?.rankingRule;
        return {...s, helpScroll: clamp(s.helpScroll + d, helpLines({ascii: s.ascii, sources: ev.result?.sources ?? [], rankingRule: rule}))};
      }
      const text = reportText(s, svc, evaluate(s.values, svc, s.units, s.ascii)).text ?? '';
      return {...s, report: {...s.report, scroll: clamp(s.report.scroll + d, text.split('\n'))}};
    }
    case 'report.format':
      return {...s, report: {format: s.report.format === 'markdown' ? 'text' : 'markdown', scroll: 0}};
    case 'report.notes':
      return startNotes(s, md => {
        const rows = bodyHeight(md.size) - 1;
        const lines = wrapLines((reportText(md, svc, evaluate(md.values, svc, md.units, md.ascii)).text ?? '').split('\n'), md.size.columns);
        const at = lines.findIndex(l => /^#+ *work order/i.test(l));
        return Math.max(0, Math.min(at - 1, lines.length - rows));
      });
    case 'report.write':
      return {...s, prompt: {kind: 'reportPath', title: 'Write the report to file', buffer: defaultReportPath(s, svc)}};
    case 'repair.hole':
      return {...s, screen: 'joint', mode: 'joint', step: STEPS.findIndex(x => x.id === 'hole'), field: 0};

    case 'prompt.ok':
      return runPrompt(s, svc);
    case 'prompt.cancel':
      return s.prompt!.kind === 'note' ? cancelNotes(s) : {...s, prompt: undefined, message: info('Cancelled')};
    case 'prompt.erase':
    case 'prompt.clear':
    case 'prompt.type': {
      const b = s.prompt!.buffer;
      const buffer = command === 'prompt.type' ? b + (ev.char ?? '') : command === 'prompt.clear' ? '' : Array.from(b).slice(0, -1).join('');
      if (s.prompt!.kind === 'note') return setNoteBuffer(s, buffer);
      return command === 'prompt.type' && b.length >= 200 ? s : {...s, message: undefined, prompt: {...s.prompt!, buffer}};
    }

    case 'confirm.yes': {
      const c = s.confirm!;
      const base = {...s, confirm: undefined};
      try {
        if (c.kind === 'delete') {
          svc.presets.remove(c.target);
          return {...base, presetList: {...s.presetList, index: Math.max(0, s.presetList.index - 1)}, message: info(`Deleted preset "${c.target}".`)};
        }
        if (c.kind === 'overwritePreset') return savePreset(base, svc, c.target, true);
        if (c.kind === 'overwriteExport') {
          svc.presets.exportFile(c.target, c.preset, true);
          return {...base, message: info(`Exported ${c.preset ? `"${c.preset}"` : 'all presets'} to ${c.target}.`)};
        }
        return writeReport(base, svc, c.target, true);
      } catch (e) {
        return {...base, message: fail(errText(e))};
      }
    }
    case 'confirm.no':
      return {...s, confirm: undefined, message: info('Left as it was')};

    case 'draft.restore': {
      const d = s.draftOffer!;
      // Back on the preset the edits were made to, so s saves into it.
      let preset = s.preset;
      if (d.presetName && d.presetName !== s.preset.name) {
        try {
          const p = svc.presets.load(d.presetName);
          preset = {name: p.name, readOnly: p.readOnly, saved: snapshot(p.values)};
        } catch {
          // That preset is gone: the edits stay on the open one.
        }
      }
      return {...s, preset, draftOffer: undefined, values: d.values, mode: d.mode === 'screw' && svc.checkScrew ? 'screw' : s.mode, step: 0, field: 0, message: info(`Restored the unsaved edits of ${d.savedAt.slice(0, 16).replace('T', ' ')}`)};
    }
    case 'draft.discard':
      try {
        svc.draft.clear();
      } catch {
        // A draft that cannot be removed is offered again next time; nothing is lost.
      }
      return {...s, draftOffer: undefined, message: info('Draft discarded')};
  }
  return s;
}

/** Apply every key of one input event. */
export function handleKeys(s: WorkbenchState, events: KeyEvent[], svc: WorkbenchServices): WorkbenchState {
  let out = s;
  for (const ev of events) {
    out = handleKey(out, ev, svc);
    if (out.quit) break;
  }
  return out;
}
