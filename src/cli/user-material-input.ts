/**
 * Attach the user's own parent material (from the preset store) to a joint
 * whose --parent names one that is not in the shipped library. The store is
 * opened only then, so ordinary commands do not touch it.
 */
import type {CliIo} from './io.js';
import type {JointInput} from '../core/joint/input.js';
import {parentMaterial} from '../core/materials/index.js';

export async function withMyMaterial(input: JointInput, io: CliIo): Promise<JointInput> {
  if (input.parent === undefined || input.parentData !== undefined || parentMaterial(input.parent)) return input;
  const {openPresetStore} = await import('../store/presets.js');
  const {configDir} = await import('../store/paths.js');
  const {withUserMaterial} = await import('../store/user-materials.js');
  const store = openPresetStore(configDir(io.env));
  for (const w of store.warnings()) io.err(`tapwright: ${w}\n`);
  return withUserMaterial(input, store.userMaterials());
}
