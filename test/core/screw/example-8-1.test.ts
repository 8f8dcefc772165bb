import {describe, expect, it} from 'vitest';
import {checkScrew, ScrewInputSchema} from '../../../src/core/screw/index.js';

/**
 * Shigley's Mechanical Engineering Design, 9th ed. (Budynas & Nisbett), Example 8-1,
 * p. 419: square-thread power screw, d = 32 mm, p = 4 mm, double thread,
 * f = fc = 0.08, dc = 40 mm, F = 6.4 kN.
 *
 * The statement and the start of the solution, part (a) (depth = width = p/2 = 2 mm,
 * dm = 32 - 4/2 = 30 mm, dr = d - p), were read in a stored copy of p. 419. The printed
 * answers of parts (b) to (h) are on the next page and were not read here; the last test
 * checks them as recalled (from memory), to the digits the book prints.
 * Every expected value below is computed by hand from the book's equations (the
 * arithmetic is shown), independently of the code under test.
 *
 * The torque equations were confirmed in a stored copy of the book pages
 * (pp. 416-417: Eqs. 8-1, 8-2, 8-3, 8-4, 8-5, 8-6). They also follow from the
 * inclined plane (p. 415, Fig. 8-6): with tan(lambda) = l/(pi dm), pushing the load
 * up the plane needs P = F (sin l + f cos l)/(cos l - f sin l); dividing by cos(lambda)
 * gives P = F (tan l + f)/(1 - f tan l) = F (l + pi f dm)/(pi dm - f l), and T = P dm/2
 * is Eq. 8-1. Lowering reverses the friction force: Eq. 8-2. The test
 * "inclined plane" below checks that derivation numerically.
 */
const input = ScrewInputSchema.parse({
  thread: 'square 32x4',
  starts: 2,
  load: 6400,
  muThread: 0.08,
  muCollar: 0.08,
  collarDiameter: 40,
  nutLength: 48, // not part of the example: 12 threads, so the 0.38 share of p. 419 applies
  nutMaterial: 'bronze',
});
const r = checkScrew(input);

describe('Shigley 9th ed. Example 8-1 (square thread with collar)', () => {
  it('(a) geometry: depth = width = p/2 = 2 mm; dm = 32 - 2 = 30 mm; dr = 32 - 4 = 28 mm; l = 2 x 4 = 8 mm', () => {
    expect(r.geometry.engagementDepth).toBeCloseTo(2, 12);
    expect(r.geometry.meanDiameter).toBeCloseTo(30, 12);
    expect(r.geometry.rootDiameter).toBeCloseTo(28, 12);
    expect(r.lead).toBeCloseTo(8, 12);
  });

  it('(b) raise torque, Eqs. 8-1 + 8-6', () => {
    // Eq. 8-1: TR = (6400 x 30/2) (8 + pi 0.08 30) / (pi 30 - 0.08 x 8)
    //            = 96 000 x (8 + 7.539822) / (94.247780 - 0.64) = 96 000 x 0.1660098 = 15 936.95 N·mm
    // Eq. 8-6: Tc = 6400 x 0.08 x 40 / 2 = 10 240 N·mm
    // TR = 26 176.95 N·mm = 26.177 N·m
    expect(r.torque.raiseThread).toBeCloseTo(15.93695, 4);
    expect(r.torque.collar).toBeCloseTo(10.24, 9);
    expect(r.torque.raise).toBeCloseTo(26.17695, 4);
  });

  it('(b) lower torque, Eqs. 8-2 + 8-6: the thread term is negative, not self-locking', () => {
    // Eq. 8-2: TL = 96 000 x (7.539822 - 8) / (94.247780 + 0.64) = 96 000 x (-0.0048497) = -465.57 N·mm
    // TL = -465.57 + 10 240 = 9 774.43 N·mm = 9.774 N·m
    expect(r.torque.lowerThread).toBeCloseTo(-0.46557, 4);
    expect(r.torque.lower).toBeCloseTo(9.77443, 4);
    // Eq. 8-3: f = 0.08 < tan(lambda) = 8 / (pi 30) = 0.084883
    expect(r.selfLocking).toBe(false);
    expect(r.selfLockingFriction).toBeCloseTo(0.0848826, 6);
    const backDrive = r.flags.find(f => f.code === 'back-drives');
    expect(backDrive?.level).toBe('watch'); // collar friction still holds it: TL > 0
  });

  it('(c) efficiency, Eq. 8-4: e = F l / (2 pi TR) = 6400 x 8 / (2 pi 26 176.95) = 0.31129', () => {
    expect(r.efficiency).toBeCloseTo(0.311294, 5);
  });

  it('(d) body stresses, Eqs. 8-7 and 8-8', () => {
    // tau = 16 TR / (pi dr^3) = 16 x 26 176.95 / (pi 28^3) = 418 831.3 / 68 964.6 = 6.0732 MPa
    // sigma = -4F / (pi dr^2) = -25 600 / 2463.01 = -10.3938 MPa
    expect(r.stress.body.torsion).toBeCloseTo(6.07317, 4);
    expect(r.stress.body.axial).toBeCloseTo(-10.39379, 4);
  });

  it('(e)-(f) first-thread bearing and root bending with 0.38F, nt = 1 (Eqs. 8-10, 8-11, p. 419)', () => {
    // sigmaB = -2 (0.38 x 6400) / (pi 30 x 1 x 4) = -4864 / 376.991 = -12.9022 MPa
    // sigmab =  6 (0.38 x 6400) / (pi 28 x 1 x 4) = 14 592 / 351.858 = 41.4712 MPa
    expect(r.stress.firstThread.share).toBe(0.38);
    expect(r.stress.firstThread.bearing).toBeCloseTo(-12.90216, 4);
    expect(r.stress.firstThread.bending).toBeCloseTo(41.47123, 4);
    // Eq. 8-12, transverse shear at the centre of the root: 3 (0.38 x 6400)/(pi 28 x 4) = 20.7356 MPa
    expect(r.stress.firstThread.transverseShear).toBeCloseTo(20.73562, 4);
  });

  it('first-thread body components equal the body stresses of part (d) (full F and TR, as in the example)', () => {
    expect(r.stress.firstThread.axial).toBeCloseTo(r.stress.body.axial, 12);
    expect(r.stress.firstThread.torsion).toBeCloseTo(r.stress.body.torsion, 12);
  });

  it('tangential shear from the thread torque, 0.38 of the thread torque on one thread, collar torque excluded (common practice, no source; not in the example)', () => {
    // The collar torque Tc is reacted at the collar and does not pass the flanks: thread torque 15 936.95 N·mm.
    // 4 (0.38 x 15 936.95) / (pi 28^2 x 1 x 4) = 24 224.16 / 9852.035 = 2.45880 MPa
    expect(r.stress.firstThread.shear).toBeCloseTo(2.4588, 4);
  });

  it('(g) von Mises at the top of the root, Eq. 5-14 with sx = 41.471, sy = -10.394, tyz = 6.073 (the book\'s state)', () => {
    // 1/sqrt2 [ (41.471 + 10.394)^2 + 10.394^2 + 41.471^2 + 6 x 6.073^2 ]^1/2
    // = 0.70711 x (2690.0 + 108.03 + 1719.9 + 221.30)^1/2 = 0.70711 x 68.842 = 48.678 MPa
    expect(r.stress.firstThread.vonMisesTextbook).toBeCloseTo(48.6784, 3);
  });

  it('full von Mises, Eq. 5-14, the book\'s state plus tzx = tangential shear 2.4588 (as tapwright check)', () => {
    // 1/sqrt2 [ 2690.0 + 108.03 + 1719.9 + 6 x (6.073^2 + 2.4588^2) ]^1/2
    // = 0.70711 x (4517.9 + 6 x (36.883 + 6.0457))^1/2 = 0.70711 x (4775.5)^1/2 = 0.70711 x 69.105 = 48.864 MPa
    expect(r.stress.firstThread.vonMises).toBeCloseTo(48.8643, 3);
    // the flags use the full value
    expect(r.stress.firstThread.vonMises).toBeGreaterThan(r.stress.firstThread.vonMisesTextbook);
  });

  it('(h) principal stresses and maximum shear at the root', () => {
    // s1 = sx = 41.471; s2,3 = sy/2 +- sqrt((sy/2)^2 + tyz^2) = -5.197 +- 7.993 = 2.796, -13.190
    // tau_max = (41.471 + 13.190) / 2 = 27.331 MPa
    const [s1, s2, s3] = r.stress.firstThread.principalTextbook;
    expect(s1).toBeCloseTo(41.47123, 4);
    expect(s2).toBeCloseTo(2.79629, 4);
    expect(s3).toBeCloseTo(-13.19009, 4);
    expect(r.stress.firstThread.maxShearTextbook).toBeCloseTo(27.33066, 4);
  });

  it('principal stresses of the full state keep its trace and its von Mises (Shigley 9th ed. section 3-7, Eq. 5-14)', () => {
    const [s1, s2, s3] = r.stress.firstThread.principal;
    // trace: sx + sy = 41.471 - 10.394 = 31.077 MPa
    expect(s1 + s2 + s3).toBeCloseTo(31.07744, 4);
    expect(Math.sqrt(((s1 - s2) ** 2 + (s2 - s3) ** 2 + (s3 - s1) ** 2) / 2)).toBeCloseTo(48.8643, 3);
    expect(r.stress.firstThread.maxShear).toBeCloseTo((s1 - s3) / 2, 12);
    expect(r.stress.firstThread.maxShear).toBeGreaterThan(r.stress.firstThread.maxShearTextbook);
  });

  it('inclined plane (Shigley 9th ed. p. 416, eqs. (c), (d)) gives the same torques as Eqs. 8-1 and 8-2', () => {
    const lam = Math.atan(8 / (Math.PI * 30));
    const f = 0.08;
    const PR = (6400 * (Math.sin(lam) + f * Math.cos(lam))) / (Math.cos(lam) - f * Math.sin(lam));
    const PL = (6400 * (f * Math.cos(lam) - Math.sin(lam))) / (Math.cos(lam) + f * Math.sin(lam));
    expect(r.torque.raiseThread).toBeCloseTo((PR * 15) / 1000, 9);
    expect(r.torque.lowerThread).toBeCloseTo((PL * 15) / 1000, 9);
  });

  it("matches the book's printed answers to the digits printed (from memory, not read here)", () => {
    // Shigley 9th ed. Example 8-1 answers as recalled (from memory): (b) TR = 15.94 + 10.24 = 26.18 N·m,
    // TL = -0.466 + 10.24 = 9.77 N·m; (c) e = 0.311; (d) tau = 6.07 MPa, sigma = -10.39 MPa;
    // (e) sigma_B = -12.9 MPa; (f) sigma_b = 41.5 MPa; (h) sigma' = 48.7 MPa, tau_max = 27.3 MPa.
    expect(r.torque.raiseThread.toFixed(2)).toBe('15.94');
    expect(r.torque.raise.toFixed(2)).toBe('26.18');
    expect(r.torque.lowerThread.toFixed(3)).toBe('-0.466');
    expect(r.torque.lower.toFixed(2)).toBe('9.77');
    expect(r.efficiency.toFixed(3)).toBe('0.311');
    expect(r.stress.body.torsion.toFixed(2)).toBe('6.07');
    expect(r.stress.body.axial.toFixed(2)).toBe('-10.39');
    expect(r.stress.firstThread.bearing.toFixed(1)).toBe('-12.9');
    expect(r.stress.firstThread.bending.toFixed(1)).toBe('41.5');
    expect(r.stress.firstThread.vonMisesTextbook.toFixed(1)).toBe('48.7');
    expect(r.stress.firstThread.maxShearTextbook.toFixed(1)).toBe('27.3');
  });
});
