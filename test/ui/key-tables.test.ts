/**
 * The key commands are a typed union derived from the keymap: a misspelt command
 * or a missing handler does not compile (checked by `npm run typecheck`, which
 * covers the tests), and every binding reaches a handler at run time.
 */
import {describe, expect, it} from 'vitest';
import {KEYMAP, SCREEN_IDS, type Command, type CommandsOf} from '../../src/ui/keymap.js';
import type {Handler} from '../../src/ui/state/effects.js';
import {handlerFor} from '../../src/ui/state/handle-key.js';
import {SCREENS} from '../../src/ui/screens/registry.js';

const same: Handler = s => s;

describe('typed key commands', () => {
  it('refuses a misspelt command and a key table with a typo or a gap (compile time)', () => {
    // @ts-expect-error a misspelt command is not a Command
    const bad: Command = 'preset.sav';
    const good: Command = 'repair.choose';
    // @ts-expect-error a typo in a key table (the keymap has repair.choose)
    const typo = {'list.up': same, 'list.down': same, 'repair.chose': same, 'repair.hole': same, 'screen.back': same} satisfies Record<CommandsOf<'repairs'>, Handler>;
    // @ts-expect-error a key table without the handler of one of its bindings
    const gap = {'list.up': same, 'list.down': same, 'repair.hole': same, 'screen.back': same} satisfies Record<CommandsOf<'repairs'>, Handler>;
    expect([bad, good, typo, gap].length).toBe(4);
  });

  it('has one registry row per screen, in the order of the tabs, and a handler for every binding', () => {
    expect(SCREENS.map(r => r.id)).toEqual([...SCREEN_IDS]);
    for (const b of KEYMAP) expect(typeof handlerFor(b.context, b.command), `${b.context} ${b.command}`).toBe('function');
  });
});
