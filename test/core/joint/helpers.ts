/**
 * Test helpers: thread sections and geometries built from the ISO 68-1 basic-profile
 * formulas (d2 = d - 0.649519P, d3 = d - 1.226869P) and ISO 898-1 As = (pi/4)((d2+d3)/2)^2,
 * so the mechanics tests do not depend on the thread tables.
 */
import type {ThreadSection} from '../../../src/core/joint/tightening.js';

export function isoSection(d: number, P: number): ThreadSection {
  const d2 = d - 0.649519 * P;
  const d3 = d - 1.226869 * P;
  return {pitch: P, nominal: d, d2, d3, stressArea: (Math.PI / 4) * ((d2 + d3) / 2) ** 2};
}
