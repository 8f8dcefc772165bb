/**
 * Surface pressure under the bolt head (and nut). MPa, N, mm.
 * p = F / A_p, A_p = pi/4 (d_w^2 - d_h^2), against the limiting pressure p_G of the
 * clamped material (VDI 2230 Part 1, surface pressure check; the area formula from memory).
 */

/** Bearing area of a head or nut, mm²: pi/4 (d_w^2 - d_h^2) (VDI 2230 Part 1, from memory). */
export function bearingArea(dw: number, dh: number): number {
  return (Math.PI / 4) * (dw * dw - dh * dh);
}

/**
 * Outside diameter a hardened washer needs so the part sees no more than p_G, mm:
 * d = sqrt(4 F / (pi p_G) + d_h^2) (the same area formula solved for d_w).
 */
export function washerDiameterFor(force: number, limit: number, dh: number): number {
  return Math.sqrt((4 * force) / (Math.PI * limit) + dh * dh);
}
