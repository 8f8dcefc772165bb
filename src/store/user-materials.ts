/**
 * Parent materials of the user's own, kept in the preset store's `materials`
 * list. Each is validated with the joint's UserParentMaterialSchema; an entry
 * that no longer validates is kept in the file (never dropped) and ignored.
 */
import {UserParentMaterialSchema, type UserParentMaterial, type JointInput} from '../core/joint/input.js';
import {parentMaterial} from '../core/materials/index.js';
import {StoreError} from './errors.js';
import type {State} from './store-file.js';

const key = (id: string) => id.trim().toLowerCase();

export function readUserMaterials(s: State): UserParentMaterial[] {
  const out: UserParentMaterial[] = [];
  for (const raw of s.materials) {
    const r = UserParentMaterialSchema.safeParse(raw);
    if (r.success) out.push(r.data);
  }
  return out.sort((a, b) => a.id.localeCompare(b.id));
}

export function putUserMaterial(s: State, draft: unknown, overwrite: boolean): UserParentMaterial {
  const r = UserParentMaterialSchema.safeParse(draft);
  if (!r.success) {
    const issue = r.error.issues[0];
    throw new StoreError(`material: ${issue?.path.join('.') || 'entry'}: ${issue?.message ?? 'invalid'}`);
  }
  const m = r.data;
  if (parentMaterial(m.id)) throw new StoreError(`material "${m.id}" is an id of the shipped library; give yours an id of its own`);
  const at = s.materials.findIndex(x => UserParentMaterialSchema.safeParse(x).success && key((x as UserParentMaterial).id) === key(m.id));
  if (at >= 0 && !overwrite) throw new StoreError(`material "${m.id}" is already stored; add --overwrite to replace it`);
  if (at >= 0) s.materials[at] = m;
  else s.materials.push(m);
  return m;
}

export function dropUserMaterial(s: State, id: string): void {
  const at = s.materials.findIndex(x => UserParentMaterialSchema.safeParse(x).success && key((x as UserParentMaterial).id) === key(id));
  if (at < 0) throw new StoreError(`no material "${id}" of yours is stored; see tapwright materials --kind parent`);
  s.materials.splice(at, 1);
}

/**
 * The input with the user's material attached when `parent` names one that is
 * not in the shipped library (the core then uses its strengths and source).
 */
export function withUserMaterial(input: JointInput, materials: readonly UserParentMaterial[]): JointInput {
  if (input.parent === undefined || parentMaterial(input.parent)) return input;
  const m = materials.find(x => key(x.id) === key(input.parent as string));
  return m ? {...input, parentData: m} : input;
}
