import {describe, expect, it} from 'vitest';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';

// ASME B18.2.2 hex nut 1/2 in: H min 0.427 in (10.85 mm), F 3/4 in (values from a reproduction of the table).
describe('check on an inch thread with a nut class and no nut height', () => {
  it('check --thread "1/2-13 UNC" --nut SAE-5 computes (exit 0 or 3) on the ASME B18.2.2 hex nut', async () => {
    const io = memoryIo({env: {}});
    const code = await runCli(['check', '--thread', '1/2-13 UNC', '--nut', 'SAE-5', '--json'], io);
    expect(io.stderr()).toBe('');
    expect([0, 3]).toContain(code);
    const j = JSON.parse(io.stdout()) as {notes: string[]};
    expect(j.notes.join(' ')).toMatch(/Nut height 10\.85 mm .*ASME B18\.2\.2 hex nuts/);
  });
});
