/**
 * The command registry. Each command module is loaded only when it is run, so a
 * scripting call never loads the workbench (Ink, React) or other commands.
 */
import type {Command} from '../command.js';

export interface CommandEntry {
  name: string;
  summary: string;
  load: () => Promise<Command>;
}

export const COMMANDS: CommandEntry[] = [
  {name: 'check', summary: 'one joint: preload, stresses, stripping, margins, flags', load: async () => (await import('./check.js')).command},
  {name: 'repair', summary: 'ranked repairs for a weak or stripped thread', load: async () => (await import('./repair.js')).command},
  {name: 'screw', summary: 'lead screw and nut: torque, efficiency, stresses, buckling', load: async () => (await import('./screw.js')).command},
  {name: 'threads', summary: 'geometry and limits of size of a thread designation', load: async () => (await import('./threads.js')).command},
  {name: 'materials', summary: 'bolt grades, nut classes, parent materials, with sources', load: async () => (await import('./materials.js')).command},
  {name: 'inserts', summary: 'solid key-locked insert tables: the demo one and yours', load: async () => (await import('./inserts.js')).command},
  {name: 'settings', summary: 'display units, ASCII drawing, default scatter factor', load: async () => (await import('./settings.js')).command},
  {name: 'presets', summary: 'saved joints: list, show, save, rename, delete, import', load: async () => (await import('./presets.js')).command},
];
