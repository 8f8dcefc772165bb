/**
 * The least clamp load the service needs, carried back to assembly: the lowest preload the
 * tightening may give so that, after embedding and the worst temperature change, the clamp
 * load left under the largest service load still holds the joint closed and against slip.
 *
 *   FM,min = FK,erf + (1 - C) FA,max + FZ + max(0, -dF_th)
 *
 * FK,erf  clamp load needed against slip, F_Q / (q_F mu_T) (VDI 2230 Part 1:2003 R12/2, as the
 *         service state computes it), 0 without a transverse load; separation is FK,erf = 0 with
 *         (1 - C) FA,max the clamp load the external load takes off (Shigley's Mechanical
 *         Engineering Design, 9th ed., Eqs. 8-24 and 8-29: Fm = (1 - C) P - Fi; VDI 2230 Part 1
 *         R1 has the same sum with Phi_n for C, equation number from memory)
 * FZ      preload lost to embedding (VDI 2230 Part 1, from memory; ServiceResult.embeddingLoss)
 * dF_th   preload change from temperature, + = gain (ServiceResult.thermalChange); only a loss adds
 * Units: N.
 */
import type {ServiceResult} from '../service/result.js';

export interface LeastClampAtAssembly {
  /** The least preload at assembly, N. */
  value: number;
  /** Its terms, N: the clamp needed against slip, the load share taken off the parts, embedding, thermal loss. */
  slip: number;
  separation: number;
  embedding: number;
  thermal: number;
  source: string;
}

export const LEAST_CLAMP_SOURCE =
  "FM,min = FK,erf + (1 - C) FA,max + FZ + thermal loss: Shigley's Mechanical Engineering Design 9th ed. Eqs. 8-24, 8-29; VDI 2230 Part 1 R1 and R12/2 (equation numbers from memory)";

/**
 * The least clamp load at assembly from a service state, N (formula and sources in the file
 * comment). Undefined when the service state knows no clamped parts and no transverse load
 * (model 'in-full': the share the parts carry, embedding and separation are not computed).
 */
export function leastClampAtAssembly(s: ServiceResult): LeastClampAtAssembly | undefined {
  const slip = s.slip?.requiredClamp ?? 0;
  if (s.model === 'in-full' && slip === 0) return undefined;
  const separation = (1 - s.jointConstant) * s.serviceLoad.max;
  const embedding = s.embeddingLoss;
  const thermal = Math.max(0, -s.thermalChange);
  return {value: slip + separation + embedding + thermal, slip, separation, embedding, thermal, source: LEAST_CLAMP_SOURCE};
}
