/** The sensitivity list in US units names no metric unit (issue 14 item 13). Demo joint of our own. */
import {describe, expect, it} from 'vitest';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';

describe('tightening window and sensitivity in US units', () => {
  it('a 1/2-13 grade 5 screw in grey iron: the settings of each input are in inch units', async () => {
    const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: '/nonexistent-tapwright-test'}});
    await runCli(['check', '--thread', '1/2-13 UNC', '--bolt', 'SAE-5', '--parent', 'EN-GJL-250', '--engage', '0.75', '--units', 'us', '--torque', '60ft-lbf'], io);
    const text = io.stdout();
    const sens = text.slice(text.indexOf('TIGHTENING WINDOW'));
    expect(sens).toMatch(/parent strength moves it/);
    expect(sens).not.toMatch(/\d (mm|MPa|kN|N\u00b7m)\b/);
  });
});
