/**
 * Duty (lifting, pressure, safety-critical) and the one-line caution.
 * The duty rule is tapwright's own policy (common practice, no source): a margin that is
 * only WATCH for general duty is not accepted where a failure can hurt someone.
 */
import {describe, expect, it} from 'vitest';
import {applyDuty, DUTY_IDS, RAISED_ON_DUTY} from '../../src/core/duty.js';
import {CAUTION_ONE_LINE, cautionLine} from '../../src/core/cautions.js';
import {checkScrew} from '../../src/core/screw/index.js';
import {ScrewInputSchema} from '../../src/core/screw/input.js';
import {checkJoint} from '../../src/core/joint/index.js';
import {JointInputSchema} from '../../src/core/joint/input.js';
import type {Flag} from '../../src/core/types.js';

const watch = (code: string): Flag => ({code, level: 'watch', message: `${code} demo`, summary: `${code} demo`});

describe('applyDuty', () => {
  it('leaves general duty as it is', () => {
    const flags = [watch('buckling'), watch('strips-before-break')];
    expect(applyDuty(flags, 'general')).toEqual(flags);
  });
  it('raises every listed WATCH to FAIL with the reason, and adds the sign-off flag first', () => {
    for (const duty of DUTY_IDS.filter(d => d !== 'general')) {
      const out = applyDuty([...RAISED_ON_DUTY].map(watch), duty);
      expect(out[0]?.code).toBe('qualified-sign-off');
      expect(out[0]?.message).toMatch(/qualified person's sign-off/);
      expect(out[0]?.summary?.length ?? 99).toBeLessThanOrEqual(68);
      for (const f of out.slice(1)) {
        expect(f.level).toBe('fail');
        expect(f.message).toMatch(/raised to FAIL: a WATCH margin is not accepted for/);
      }
    }
  });
  it('does not raise flags outside the list (nonstandard pitch stays WATCH)', () => {
    expect(applyDuty([watch('nonstandard-pitch')], 'pressure')[1]?.level).toBe('watch');
  });
  it('raises "self-locking only just" to FAIL on lifting duty only', () => {
    const info: Flag = {code: 'self-locking-marginal', level: 'info', message: 'only just'};
    expect(applyDuty([info], 'lifting')[1]?.level).toBe('fail');
    expect(applyDuty([info], 'critical')[1]?.level).toBe('info');
  });
});

describe('duty through the core checks (demo inputs)', () => {
  // Demo: a lifting-table lead screw whose column margin is only just above 1 (about 1.03; invented numbers).
  const screw = (duty: string) => checkScrew(ScrewInputSchema.parse({thread: 'Tr24x5', load: 4500, nutLength: 30, length: 800, ends: 'fixed-free', duty}));
  it('a buckling WATCH on a general screw becomes FAIL on a lifting screw', () => {
    expect(screw('general').flags.find(f => f.code === 'buckling')?.level).toBe('watch');
    expect(screw('lifting').flags.find(f => f.code === 'buckling')?.level).toBe('fail');
  });
  it('a lifting joint always carries the sign-off flag', () => {
    const r = checkJoint(JointInputSchema.parse({thread: 'M10x1.5-6H/6g', parent: 'S355', engagement: 15, duty: 'lifting'}));
    expect(r.flags[0]?.code).toBe('qualified-sign-off');
    const g = checkJoint(JointInputSchema.parse({thread: 'M10x1.5-6H/6g', parent: 'S355', engagement: 15}));
    expect(g.flags.some(f => f.code === 'qualified-sign-off')).toBe(false);
  });
});

describe('cautionLine', () => {
  it('fits the width and names the qualified sign-off from 76 columns up', () => {
    for (let w = 10; w <= 220; w++) {
      const line = cautionLine(w);
      expect(line.length).toBeLessThanOrEqual(w);
      if (w >= 76) expect(line).toMatch(/qualified/);
      if (w >= 76) expect(line).toMatch(/[Ll]ifting/);
    }
    expect(cautionLine(80)).toBe(CAUTION_ONE_LINE[3]);
  });
});
