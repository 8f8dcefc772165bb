/**
 * The cautions shown by the workbench, every report and the CLI help.
 * One wording, kept here so the screens and reports cannot drift apart.
 */
export const CAUTION_SHORT =
  'Estimates only. Follow the equipment maker, local codes and licensed engineering practice.';

export const CAUTION_LINES: readonly string[] = [
  'CAUTION: these results are engineering estimates from published methods, not a guarantee.',
  'Follow the equipment maker\'s instructions, local codes and licensed engineering practice.',
  'Lifting equipment, pressure boundaries and safety-critical joints need a qualified person\'s sign-off.',
  'Check material strengths against the certificates; typical values here are marked as such.',
];

/** The cautions word-wrapped to `width` columns (continuation lines indented by two spaces). */
export function cautionText(width = 80): string {
  const out: string[] = [];
  for (const line of CAUTION_LINES) {
    let current = '';
    for (const word of line.split(' ')) {
      const next = current === '' ? word : `${current} ${word}`;
      if (next.length > width && current !== '') {
        out.push(current);
        current = `  ${word}`;
      } else current = next;
    }
    out.push(current);
  }
  return out.join('\n');
}

/**
 * The caution in one line of at most `width` characters: the longest wording that
 * fits. From about 76 columns up it names lifting equipment, pressure boundaries,
 * safety-critical joints and the qualified person's sign-off; below that, the
 * shortest wording. Longest first.
 */
export const CAUTION_ONE_LINE: readonly string[] = [
  'Estimates only. Follow the equipment maker, local codes and licensed engineering practice. Lifting equipment, pressure boundaries and safety-critical joints need a qualified person\'s sign-off.',
  'Estimates only; follow the maker, local codes and licensed practice. Lifting, pressure and safety-critical joints need a qualified person\'s sign-off.',
  'Estimates only; follow maker, codes, licensed practice. Lifting, pressure, critical joints: qualified sign-off.',
  'Estimates only. Lifting, pressure, critical joints need a qualified sign-off.',
  'Estimates only; qualified sign-off for lifting, pressure, critical.',
  'Estimates only; qualified sign-off for critical joints.',
  'Estimates only.',
];

export function cautionLine(width: number): string {
  for (const line of CAUTION_ONE_LINE) if (line.length <= width) return line;
  return (CAUTION_ONE_LINE.at(-1) ?? '').slice(0, Math.max(0, width));
}
