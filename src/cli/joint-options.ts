/**
 * The joint options of `tapwright check`, for other commands that take a joint
 * on the command line (`presets save`). The mapping itself is check's own
 * (buildDraft and validate in commands/check.ts), so a joint saved as a preset
 * is read exactly as `check` would read the same options.
 */
import {resolveGeometry, sizeWords} from '../core/joint/resolve.js';
import {nutDimensions} from '../core/materials/index.js';
import type {JointInput, JointInputDraft} from '../core/joint/input.js';
import {unitsOption, type OptionSpec, type ParsedOptions} from './args.js';
import {UsageError} from './io.js';
import {buildDraft, optionFor, validate} from './commands/check.js';

/** Every joint option of check (issue 3), plus --scatter, --margin and --units (how bare numbers are read). */
export const JOINT_OPTIONS = Object.fromEntries(
  [
    'thread', 'bolt', 'bolt-rm', 'bolt-rp', 'parent', 'parent-rm', 'parent-shear', 'nut', 'nut-height', 'nut-flats',
    'engage', 'chamfer', 'hole-depth', 'torque', 'preload', 'utilisation', 'mu-thread', 'mu-head', 'nut-factor',
    'bearing-diameter', 'service-load', 'scatter', 'margin', 'units',
  ].map(name => [name, {type: 'string'}]),
) as OptionSpec;

export {optionFor};

/** Help lines for the joint options (80 columns); `tapwright check --help` explains each. */
export const JOINT_OPTIONS_HELP = [
  '  --thread TEXT            thread and tolerance class: M10x1.5-6H/6g, 3/8-16 UNC',
  '  --bolt ID | --bolt-rm, --bolt-rp        bolt grade, or custom Rm and Rp0.2',
  '  --parent ID | --parent-rm, --parent-shear   tapped hole: parent material',
  '  --nut CLASS [--nut-height L] [--nut-flats L]   a nut instead of a tapped hole',
  '  --engage L, --chamfer L, --hole-depth L    engagement and hole (12mm, 0.5in)',
  '  --torque T | --preload F | --utilisation R    how it is tightened',
  '  --mu-thread MU, --mu-head MU (value or min..max), --nut-factor K',
  '  --bearing-diameter L, --service-load F, --scatter A, --margin M',
  '  --units si|us            unit of a bare number (JSON is always SI)',
  '  Ranges and defaults: tapwright check --help.',
].join('\n');

/**
 * A JointInput from parsed options over `base` (a preset's joint, to change
 * some values). Throws UsageError naming the option and the accepted range.
 */
export function jointFromOptions(values: ParsedOptions['values'], base?: JointInputDraft): JointInput {
  const u = unitsOption(values);
  const draft = buildDraft(values, u, base);
  if (draft.thread === undefined) throw new UsageError('--thread is needed, e.g. --thread M10x1.5-6H/6g (or --from PRESET)', '--thread');
  if (draft.engagement === undefined && draft.internal === 'nut') {
    // As check does: a nut engages over its height (given, or ISO 4032 m min).
    if (draft.nutHeight !== undefined) draft.engagement = draft.nutHeight;
    else {
      const g = resolveGeometry(draft.thread);
      const dims = nutDimensions(g.nominal);
      if (!dims) throw new UsageError(`--nut-height or --engage is needed: no tabulated nut height for ${sizeWords(g)}`, '--nut-height');
      draft.engagement = dims.heightMin;
    }
  }
  return validate(draft, u);
}
