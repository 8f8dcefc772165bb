/**
 * "Did you mean" for a misspelt library id (a grade, a nut class, a material):
 * the closest ids by edit distance after case, spaces and punctuation are
 * dropped. Pure; no data of its own.
 */

function squash(s: string): string {
  return s.toLowerCase().replace(/[^a-z0-9]/g, '');
}

/** Levenshtein distance (insert, delete, substitute, each 1). */
export function editDistance(a: string, b: string): number {
  let prev = Array.from({length: b.length + 1}, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const row = [i];
    for (let j = 1; j <= b.length; j++) {
      row[j] = Math.min((prev[j] ?? 0) + 1, (row[j - 1] ?? 0) + 1, (prev[j - 1] ?? 0) + (a[i - 1] === b[j - 1] ? 0 : 1));
    }
    prev = row;
  }
  return prev[b.length] ?? 0;
}

/**
 * Up to `limit` ids nearest to `typed`: an id equal after squashing ("8,8" ->
 * 8.8, "s355" -> S355), then ids that start with or contain the typed text
 * ("alsi7mg" -> AlSi7Mg-T6), then ids within an edit distance of about a third
 * of the typed length (at least 1, at most 3).
 */
export function nearestIds(typed: string, ids: readonly string[], limit = 3): string[] {
  const t = squash(typed);
  if (t === '') return [];
  const scored = ids.map(id => {
    const s = squash(id);
    let score: number;
    if (s === t) score = 0;
    else if (s.startsWith(t) || t.startsWith(s)) score = 1 + Math.abs(s.length - t.length) / 100;
    else if (s.includes(t)) score = 2;
    else score = 3 + editDistance(s, t);
    return {id, score, distance: score >= 3 ? score - 3 : 0};
  });
  // The same id typed with other case or punctuation ("8,8", "sae5") is the answer on its own.
  const same = scored.filter(x => x.score === 0);
  if (same.length) return same.slice(0, limit).map(x => x.id);
  const maxDistance = Math.min(3, Math.max(1, Math.round(t.length / 3)));
  return scored
    .filter(x => x.score < 3 || x.distance <= maxDistance)
    .sort((a, b) => a.score - b.score)
    .slice(0, limit)
    .map(x => x.id);
}

/** '; did you mean 8.8?' or '' when nothing is near (goes after the accepted list). */
export function didYouMean(typed: string, ids: readonly string[]): string {
  const near = nearestIds(typed, ids);
  return near.length ? `; did you mean ${near.join(' or ')}?` : '';
}
