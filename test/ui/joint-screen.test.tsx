import {afterEach, describe, expect, it} from 'vitest';
import {cleanup} from 'ink-testing-library';
import {startApp} from '../support/start-app.js';
import {KEY} from '../support/keys.js';

afterEach(() => cleanup());

describe('joint screen', () => {
  it('draws at most rows-1 lines at 80x24 with the caution and the hint line', async () => {
    const app = startApp();
    await app.see('Preload');
    const lines = app.frame().split('\n');
    expect(lines.length).toBeLessThanOrEqual(23);
    expect(lines.every(l => l.length <= 80)).toBe(true);
    expect(app.frame()).toContain('Estimates only. Follow the equipment maker, local codes and licensed');
    expect(app.frame()).toContain('q quit');
    expect(app.frame()).toContain('Preset: demo-fixture (shipped demo, read-only)  saved');
    app.unmount();
  });
});
