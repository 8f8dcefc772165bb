/**
 * The von Mises equivalent stress (Shigley, Mechanical Engineering Design, 9th ed., Eq. 5-14).
 * One implementation for the joint and the power screws: src/core/von-mises.ts.
 */
export {vonMises, vonMisesAxialShear, principalStresses, type StressState} from '../von-mises.js';
