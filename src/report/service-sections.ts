/**
 * The content of the Service section of a report, independent of its layout:
 * groups of rows, each number with its method and source. Values arrive in working
 * units (N, N/mm, MPa, mm) and are formatted here for SI or US display.
 */
import type {ServiceResult} from '../core/service/result.js';
import {CONVERSION, formatNumber} from '../core/units.js';
import {q, type Fmt, type Group, type Row} from './sections.js';

/** Stiffness, N/mm: kN/mm (SI) or klbf/in (US). */
export function stiffnessText(v: number, f: Fmt): string {
  return f.units === 'si' ? `${formatNumber(v / 1000, 4)} kN/mm` : `${formatNumber(v / (CONVERSION.LBF_N / CONVERSION.IN_MM) / 1000, 4)} klbf/in`;
}

/** A factor; absent or infinite means there is no load to divide by. */
function factor(x: number | undefined): string {
  return x !== undefined && Number.isFinite(x) ? x.toFixed(2) : 'no load';
}

function pct(x: number): string {
  return `${Math.round(x * 100)} %`;
}

/** The groups of the Service section. */
export function serviceGroups(s: ServiceResult, f: Fmt): Group[] {
  const F = (n: number) => q(n, 'force', f);
  const L = (n: number) => q(n, 'length', f);
  const S = (n: number) => q(n, 'stress', f);
  const groups: Group[] = [];
  const load = s.serviceLoad.cyclic ? `${F(s.serviceLoad.min)} to ${F(s.serviceLoad.max)}, cycling` : `${F(s.serviceLoad.max)}, static`;

  if (s.model === 'in-full') {
    groups.push({
      title: 'Service state',
      rows: [
        {label: 'Service load', value: load, note: 'per bolt'},
        {label: 'Load sharing', value: 'taken in full by the bolt', note: 'no clamped parts given (--clamp): separation, embedding and fatigue not computed'},
        {label: 'Yield (proof) factor', value: factor(s.factors.yield), note: "proof load / (largest preload + service load); Shigley's Mechanical Engineering Design, 9th ed. Eq. 8-28 with C = 1"},
        {label: 'Load factor', value: factor(s.factors.load), note: 'Shigley 9th ed. Eq. 8-29 with C = 1'},
      ],
    });
    return groups;
  }

  const parts: Row[] = (s.parts ?? []).map((p, i) => ({
    label: `Part ${i + 1}`,
    value: `${L(p.thickness)} ${p.id === 'modulus' ? 'part' : p.id}, E ${formatNumber(p.modulus / 1000, 3)} GPa${p.inGrip < p.thickness - 1e-9 ? `, ${L(p.inGrip)} in the grip` : ''}`,
    note: p.modulusSource.source,
  }));
  groups.push({title: 'Clamped parts (head side first)', rows: [...parts, {label: 'Grip', value: L(s.grip ?? 0), note: "Shigley's Mechanical Engineering Design, 9th ed. Table 8-7 (tapped hole: h + d/2, or h + t2/2 when thinner than d)"}]});

  const st = s.stiffness;
  if (st) {
    const lengths = st.boltLengths;
    const rule =
      lengths?.rule === 'threaded-through-grip'
        ? 'threaded through the grip (no bolt length given)'
        : `${L(lengths?.unthreaded ?? 0)} shank and ${L(lengths?.threaded ?? 0)} thread in the grip, thread length ${L(lengths?.threadLength ?? 0)}${lengths?.rule === 'standard' ? ' by the Table 8-7 rule' : ' as given'}`;
    const rows: Row[] = [
      {label: 'Bolt stiffness', value: stiffnessText(st.bolt, f), note: `two springs in series, Shigley 9th ed. Eq. 8-17; ${rule}`},
      {label: 'Member stiffness (frusta)', value: stiffnessText(st.members, f), note: "conical frusta at 30 deg from a 1.5 d washer face, Marks' Calculations for Machine Design Eq. 8.20, in series (Shigley Eq. 8-18)"},
    ];
    if (st.membersExponential !== undefined) rows.push({label: 'Member stiffness (fit)', value: stiffnessText(st.membersExponential, f), note: 'one material: exponential fit, Shigley 9th ed. Eq. 8-23 and Table 8-8 (Wileman et al. 1991), for comparison'});
    rows.push({label: 'Joint constant C', value: s.jointConstant.toFixed(3), note: `kb / (kb + km) (Marks Eq. 8.35): the bolt sees ${pct(s.jointConstant)} of the service load, the parts ${pct(1 - s.jointConstant)}`});
    groups.push({title: 'Stiffness', rows});
  }

  groups.push({
    title: 'Preload in service',
    rows: [
      {label: 'Service load', value: load, note: 'per bolt'},
      {label: 'Preload used', value: `${F(s.preload.min)} to ${F(s.preload.max)}`, note: s.preload.source},
      {label: 'Embedding loss', value: F(s.embeddingLoss), note: `settling of ${formatNumber(s.embeddingAmount * 1000, 3)} um; ${s.embeddingSource}; F_Z = f_Z / (1/kb + 1/km)`},
      {label: 'Thermal change', value: F(s.thermalChange), note: '+ gain, - loss; differential expansion of bolt and parts with both springs (Bickford Eq. 11.13 form, derived)'},
      {label: 'Preload retained', value: `${F(s.preloadRetained.min)} to ${F(s.preloadRetained.max)}`, note: 'after embedding, at the worse of assembly and service temperature'},
      {label: 'Separation load', value: s.separationLoad === undefined ? 'not computed' : F(s.separationLoad), note: 'P0 = F_i,min / (1 - C), Marks Eq. 8.47'},
      {label: 'Clamp left at max load', value: F(s.clampUnderLoad), note: 'F_i,min - (1 - C) P_max; at or below zero the joint opens, loosens and leaks'},
      {label: 'Largest bolt load', value: F(s.boltLoadMax), note: 'F_i,max + C P_max (Marks Eq. 8.39)'},
    ],
  });

  const fr: Row[] = [
    {label: 'Yield (proof) factor', value: factor(s.factors.yield), note: 'S_p A_t / (C P + F_i,max), Shigley 9th ed. Eq. 8-28'},
    {label: 'Load factor', value: factor(s.factors.load), note: '(S_p A_t - F_i,max) / (C P), Shigley 9th ed. Eq. 8-29'},
    {label: 'Separation factor', value: factor(s.factors.separation), note: 'F_i,min retained / [P (1 - C)], Shigley 9th ed. Eq. 8-30'},
  ];
  if (s.factors.fatigue !== undefined) fr.push({label: 'Fatigue factor (Goodman)', value: factor(s.factors.fatigue), note: 'below 1 the bolt cracks at the first engaged thread after many cycles'});
  groups.push({title: 'Factors of safety', rows: fr});

  if (s.fatigue) {
    const z = s.fatigue;
    groups.push({
      title: 'Fatigue of the bolt thread (load cycles)',
      rows: [
        {label: 'Alternating stress', value: S(z.alternatingStress), note: 'C (P_max - P_min) / (2 A_t), Shigley 9th ed. Eq. 8-35'},
        {label: 'Mean stress', value: S(z.meanStress), note: 'C (P_max + P_min) / (2 A_t) + F_i / A_t, Eq. 8-36'},
        {label: 'Endurance strength', value: S(z.enduranceStrength), note: z.enduranceSource},
        {label: 'Goodman factor', value: factor(z.goodman), note: 'Goodman line met along the load line from the preload, Shigley 9th ed. p. 445 and Eq. 8-45'},
        {label: 'Yield check', value: factor(z.yieldCheck), note: 'S_p / (sigma_m + sigma_a), Eq. 8-51'},
        {label: 'VDI 2230 thread endurance', value: `${S(z.vdiEndurance)} (factor ${factor(z.vdiFactor)})`, note: 'rolled before heat treatment, 0.85 (150/d + 45), VDI 2230 Part 1 (2003), from memory; 1.2 wanted'},
      ],
    });
  }

  const b = s.bearingPressure;
  if (b) {
    const rows: Row[] = [
      {label: 'Pressure under the head', value: S(b.head), note: `largest bolt load on pi/4 (d_w^2 - d_h^2), d_w ${L(b.bearingDiameter)}, hole ${L(b.holeDiameter)} (VDI 2230 Part 1, from memory)`},
      {label: 'Limiting pressure', value: b.limit === undefined ? 'not known' : S(b.limit), note: b.limitSource ?? 'no limiting pressure for this material'},
    ];
    if (b.nut !== undefined) rows.push({label: 'Pressure under the nut', value: S(b.nut), note: b.nutLimit === undefined ? 'limit not known' : `limit ${S(b.nutLimit)}`});
    if (b.washerDiameter !== undefined) rows.push({label: 'Washer needed', value: `hardened, at least ${L(b.washerDiameter)} outside`, note: 'spreads the load to the limiting pressure'});
    groups.push({title: 'Surface pressure', rows});
  }

  if (s.slip) {
    groups.push({
      title: 'Transverse load and slip',
      rows: [
        {label: 'Transverse load', value: F(s.slip.transverseLoad), note: `interface friction ${s.slip.friction}`},
        {label: 'Clamp load needed', value: F(s.slip.requiredClamp), note: 'F_Q / mu_T, VDI 2230 Part 1:2003 R12/2 (one interface)'},
        {label: 'Clamp load left', value: F(s.slip.availableClamp), note: 'at the largest axial load'},
        {label: 'Slip factor', value: factor(s.slip.factor), note: '1.2 wanted for static loads (VDI 2230 Part 1, from memory)'},
      ],
    });
  }
  return groups;
}
