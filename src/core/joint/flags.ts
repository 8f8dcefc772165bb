/**
 * Flag rules for a checked joint. Each rule: a kebab-case code, a level
 * (info | watch | fail) and a message in shop language carrying the number behind it.
 * Thresholds are exported so the tests can check both sides of each.
 */
import type {Flag} from '../types.js';
import {toDisplay, type UnitSystem} from '../units.js';

/** Threads from which the load is shared as in a long engagement (Shigley 9th ed. p. 419: the seventh thread carries nothing). */
export const SHORT_ENGAGEMENT_THREADS = 6;
/** Assembly utilisation above which the bolt yields while it is tightened (von Mises = Rp0.2). */
export const YIELD_UTILISATION = 1;
/** Incomplete threads at the bottom of a blind tapped hole: 4 pitches (plug-tap chamfer; the same 4P allowance appears in the ASME B18.29.2M minimum drill depth). */
export const BLIND_HOLE_INCOMPLETE_PITCHES = 4;

/** Everything the rules look at; forces N, lengths mm. */
export interface FlagContext {
  internalKind: 'tapped' | 'nut';
  /** Largest preload in the range and the service load, N. */
  maxPreload: number;
  serviceLoad: number;
  weaker: 'external' | 'internal';
  weakerForce: number;
  boltBreakForce: number;
  requiredMargin: number;
  engagedThreads: number;
  firstShare: number;
  effectiveEngagement: number;
  requiredFedStd: number;
  requiredAlexander: number;
  utilisation: number;
  utilisationLimit: number;
  engagement: number;
  pitch: number;
  holeDepth?: number;
  isStandardPitch: boolean;
  designation: string;
  modelRangeNotes: string[];
  bearingEstimated: boolean;
  bearingDiameter: number;
  /**
   * A nut of the bolt's matching property class at standard height (ISO 898-2 design basis: the bolt
   * breaks first; from memory). Lowers short-engagement and the model-only stripping findings to info.
   */
  matchingNut?: boolean;
  /** Bolt break force at the minimum strength As x Rm,min, N (boltBreakForce is at Rm,max). */
  boltBreakForceMin?: number;
  /** Preload at which the assembly stress reaches the yield (utilisation 1) at the lowest friction, N (optional). */
  yieldPreload?: number;
  /**
   * Units the message numbers are written in (default 'si': kN, mm). The values in the
   * context stay in working units; only the wording changes. JSON keeps the SI messages.
   */
  units?: UnitSystem;
}

/** A force (N) in the message's units: kN in SI, lbf in US. */
function force(c: FlagContext, n: number): string {
  if (c.units === 'us') {
    const lbf = toDisplay(n, 'force', 'us');
    return `${lbf >= 100 ? Math.round(lbf).toString() : lbf.toFixed(1)} lbf`;
  }
  return `${(n / 1000).toFixed(n >= 100000 ? 0 : n >= 10000 ? 1 : 2)} kN`;
}

/** A length (mm) in the message's units: mm in SI, inches (3 decimals) in US. */
function len(c: FlagContext, x: number): string {
  if (c.units === 'us') return `${toDisplay(x, 'length', 'us').toFixed(3)} in`;
  return `${x.toFixed(x >= 100 ? 0 : 1)} mm`;
}
const pct = (x: number): string => `${Math.round(x * 100)} %`;

function side(c: FlagContext): string {
  return c.weaker === 'external' ? 'the bolt thread' : c.internalKind === 'nut' ? 'the nut thread' : 'the tapped thread';
}

/** The weaker side in one word or two, for a summary line. */
function sideShort(c: FlagContext): string {
  return c.weaker === 'external' ? 'bolt thread' : c.internalKind === 'nut' ? 'nut' : 'hole';
}

export function stripsAtPreload(c: FlagContext): Flag | undefined {
  const load = c.maxPreload + c.serviceLoad;
  const allowed = c.weakerForce / c.requiredMargin;
  if (load < allowed) return undefined;
  const service = c.serviceLoad > 0 ? ` plus ${force(c, c.serviceLoad)} service load` : '';
  const margin = c.requiredMargin !== 1 ? ` (${force(c, allowed)} with the required margin ${c.requiredMargin})` : '';
  return {
    code: 'strips-at-preload',
    level: 'fail',
    message: `Strips while tightening: up to ${force(c, c.maxPreload)} preload${service} against ${force(c, c.weakerForce)} to strip ${side(c)}${margin}.`,
    summary: `Strips while tightening: load ${force(c, load)} > ${sideShort(c)} ${force(c, c.weakerForce)}`,
  };
}

/** The reason a matching nut is trusted, in one sentence. */
const MATCHING_NUT = 'A nut of the matching property class at standard height is designed so the bolt breaks first (ISO 898-2 design basis).';

export function shortEngagement(c: FlagContext): Flag | undefined {
  if (c.engagedThreads >= SHORT_ENGAGEMENT_THREADS) return undefined;
  if (c.matchingNut) {
    return {
      code: 'short-engagement',
      level: 'info',
      message: `${c.engagedThreads.toFixed(1)} full threads engaged in the nut; the first thread takes about ${pct(c.firstShare)} of the load. ${MATCHING_NUT}`,
      summary: `${c.engagedThreads.toFixed(1)} threads in a matching nut: bolt designed to break first`,
    };
  }
  return {
    code: 'short-engagement',
    level: 'watch',
    message: `Only ${c.engagedThreads.toFixed(1)} full threads engaged (fewer than ${SHORT_ENGAGEMENT_THREADS}): the first thread takes about ${pct(c.firstShare)} of the load; the 38 % figure for long engagements is not conservative here.`,
    summary: `Only ${c.engagedThreads.toFixed(1)} full threads engaged: the first takes about ${pct(c.firstShare)}`,
  };
}

/**
 * Bolt-breaks-first (forces in N, lengths in mm). `strips-before-break`: a thread strips before
 * the bolt breaks, stripping force / bolt break force below the required margin (FAIL), or only at
 * the bolt's upper strength with a matching nut (WATCH; VDI 2230 Part 1 uses Rm,max, from memory).
 * `engagement-below-required`: the forces still put the bolt first, but less full thread is engaged
 * than Alexander/VDI 2230 or FED-STD-H28/2B Formula 1 asks for (WATCH; INFO for a matching nut).
 */
export function stripsBeforeBreak(c: FlagContext): Flag | undefined {
  const ratio = c.weakerForce / c.boltBreakForce;
  const ratioMin = c.boltBreakForceMin !== undefined ? c.weakerForce / c.boltBreakForceMin : ratio;
  if (ratio < c.requiredMargin && c.matchingNut && ratioMin >= c.requiredMargin) {
    return {
      code: 'strips-before-break',
      level: 'watch',
      message: `At the bolt's upper strength the model puts stripping first: ${side(c)} strips at ${force(c, c.weakerForce)}, the strongest bolt of the grade breaks at ${force(c, c.boltBreakForce)} (ratio ${ratio.toFixed(2)}; ${ratioMin.toFixed(2)} at the minimum strength). ${MATCHING_NUT} Use a nut of that class from a known source.`,
      summary: `Strips first at bolt Rm,max: ${ratio.toFixed(2)} (${ratioMin.toFixed(2)} at Rm,min); matching nut`,
    };
  }
  if (ratio < c.requiredMargin) {
    return {
      code: 'strips-before-break',
      level: 'fail',
      message: `Thread strips before the bolt breaks: ${side(c)} strips at ${force(c, c.weakerForce)}, the bolt breaks at ${force(c, c.boltBreakForce)} (ratio ${ratio.toFixed(2)}, required ${c.requiredMargin}).`,
      summary: `Thread strips first: ${sideShort(c)} ${force(c, c.weakerForce)} < bolt break ${force(c, c.boltBreakForce)}`,
    };
  }
  if (c.effectiveEngagement < c.requiredAlexander) {
    return {
      code: 'engagement-below-required',
      level: c.matchingNut ? 'info' : 'watch',
      message: `Thread bending and nut dilation (Alexander/VDI 2230) call for ${len(c, c.requiredAlexander)} of full thread; only ${len(c, c.effectiveEngagement)} is engaged, so a thread may strip before the bolt breaks.${c.matchingNut ? ` ${MATCHING_NUT}` : ''}`,
      summary: `Alexander/VDI 2230 wants ${len(c, c.requiredAlexander)} full thread; ${len(c, c.effectiveEngagement)} engaged`,
    };
  }
  // Formula 1 takes the shear area as twice the stress area (shear strength about
  // half the tensile strength), so it can ask for more than the force ratio does.
  if (c.effectiveEngagement < c.requiredFedStd) {
    return {
      code: 'engagement-below-required',
      level: c.matchingNut ? 'info' : 'watch',
      message: `FED-STD-H28 Formula 1 calls for ${len(c, c.requiredFedStd)} of full thread; only ${len(c, c.effectiveEngagement)} is engaged. The stripping forces still put the bolt first (ratio ${ratio.toFixed(2)}), but only because of the shear strengths assumed: confirm them or engage more thread.${c.matchingNut ? ` ${MATCHING_NUT}` : ''}`,
      summary: `FED-STD-H28 wants ${len(c, c.requiredFedStd)} full thread; ${len(c, c.effectiveEngagement)} engaged`,
    };
  }
  return undefined;
}

export function preloadOverYield(c: FlagContext): Flag | undefined {
  if (c.utilisation > YIELD_UTILISATION) {
    return {
      code: 'preload-over-yield',
      level: 'fail',
      message:
        `Bolt yields while tightening: assembly stress reaches ${pct(c.utilisation)} of its yield at the low end of the friction range.` +
        (c.yieldPreload !== undefined && c.yieldPreload < c.maxPreload
          ? ` It yields at about ${force(c, c.yieldPreload)}: the higher preloads shown are not reached, the bolt stretches instead. Lower the torque.`
          : ''),
      summary: `Bolt yields while tightening: ${pct(c.utilisation)} of yield at low friction`,
    };
  }
  if (c.utilisation > c.utilisationLimit + 1e-9) {
    return {
      code: 'preload-over-yield',
      level: 'watch',
      message: `Assembly stress reaches ${pct(c.utilisation)} of bolt yield, above the ${pct(c.utilisationLimit)} limit.`,
      summary: `Assembly stress ${pct(c.utilisation)} of bolt yield, above the ${pct(c.utilisationLimit)} limit`,
    };
  }
  return undefined;
}

export function engagementBeyondUseful(c: FlagContext): Flag | undefined {
  const needed = Math.max(c.requiredFedStd, c.requiredAlexander);
  if (c.effectiveEngagement <= needed || c.engagedThreads <= SHORT_ENGAGEMENT_THREADS) return undefined;
  // A bolt that bottoms out in a blind hole has no engagement to spare: say nothing that reads as reassurance.
  if (c.internalKind === 'tapped' && c.holeDepth !== undefined && c.engagement > c.holeDepth) return undefined;
  return {
    code: 'engagement-beyond-useful',
    level: 'info',
    message: `${len(c, c.effectiveEngagement)} of full thread engaged; ${len(c, needed)} is enough by both methods. The extra ${len(c, c.effectiveEngagement - needed)} adds nothing at the first thread.`,
    summary: `${len(c, c.effectiveEngagement)} full thread engaged; ${len(c, needed)} is enough by both methods`,
  };
}

export function blindHoleTooShallow(c: FlagContext): Flag | undefined {
  if (c.holeDepth === undefined || c.internalKind !== 'tapped') return undefined;
  const full = c.holeDepth - BLIND_HOLE_INCOMPLETE_PITCHES * c.pitch;
  if (c.engagement > c.holeDepth) {
    return {
      code: 'blind-hole-too-shallow',
      level: 'fail',
      message: `Bolt bottoms out: ${len(c, c.engagement)} of bolt goes into a ${len(c, c.holeDepth)} deep tapped hole; the torque goes into the bottom, not into preload.`,
      summary: `Bolt bottoms out: ${len(c, c.engagement)} of bolt in a ${len(c, c.holeDepth)} deep hole`,
    };
  }
  if (c.engagement > full) {
    return {
      code: 'blind-hole-too-shallow',
      level: 'watch',
      message: `Bolt end runs into the last ${BLIND_HOLE_INCOMPLETE_PITCHES} incomplete threads of the blind hole (full thread to ${len(c, Math.max(full, 0))}); only full thread is counted.`,
      summary: `Bolt end in the ${BLIND_HOLE_INCOMPLETE_PITCHES} incomplete threads; full thread to ${len(c, Math.max(full, 0))}`,
    };
  }
  return undefined;
}

export function nonstandardPitch(c: FlagContext): Flag | undefined {
  if (c.isStandardPitch) return undefined;
  return {
    code: 'nonstandard-pitch',
    level: 'watch',
    message: `${c.designation} is a special pitch: check that taps, gauges and mating parts exist for it.`,
    summary: `${c.designation} is a special pitch: check taps and gauges exist`,
  };
}

export function outsideModelRange(c: FlagContext): Flag[] {
  // A note reads "<quantity> <value> is <beyond a bound>, where <a factor> is published; held at
  // <value>" (stripping.ts): the summary keeps the part before ", where", without "strength ratio".
  const summary = (n: string) => `Outside the published range: ${n.split(', where')[0]!.replace(/^strength ratio /, '')}`;
  return c.modelRangeNotes.map(n => ({code: 'outside-model-range', level: 'watch' as const, message: `Outside the published range: ${n}.`, summary: summary(n)}));
}

export function bearingDiameterEstimated(c: FlagContext): Flag | undefined {
  if (!c.bearingEstimated) return undefined;
  return {
    code: 'bearing-diameter-estimated',
    level: 'info',
    message: `Bearing diameter under the head estimated at ${len(c, c.bearingDiameter)}; measure it and give it for a better torque.`,
    summary: `Head bearing diameter estimated (${len(c, c.bearingDiameter)}): measure it`,
  };
}

/** Every rule, in display order. */
export function jointFlags(c: FlagContext): Flag[] {
  const out: Flag[] = [];
  const push = (f: Flag | undefined): void => {
    if (f) out.push(f);
  };
  push(stripsAtPreload(c));
  push(stripsBeforeBreak(c));
  push(preloadOverYield(c));
  push(blindHoleTooShallow(c));
  push(shortEngagement(c));
  push(nonstandardPitch(c));
  out.push(...outsideModelRange(c));
  push(engagementBeyondUseful(c));
  push(bearingDiameterEstimated(c));
  return out;
}
