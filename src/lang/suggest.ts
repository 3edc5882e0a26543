/** "Did you mean …": the known name nearest to a misspelt one. */

/** Optimal-string-alignment distance: insertions, deletions, substitutions, adjacent swaps. */
export function editDistance(a: string, b: string): number {
  const rows = a.length + 1;
  const cols = b.length + 1;
  const d: number[][] = Array.from({ length: rows }, (_, i) => Array.from({ length: cols }, (_, j) => (i === 0 ? j : j === 0 ? i : 0)));
  for (let i = 1; i < rows; i++) {
    for (let j = 1; j < cols; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let best = Math.min(d[i - 1]![j]! + 1, d[i]![j - 1]! + 1, d[i - 1]![j - 1]! + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) best = Math.min(best, d[i - 2]![j - 2]! + 1);
      d[i]![j] = best;
    }
  }
  return d[a.length]![b.length]!;
}

/**
 * The candidate nearest to `name`, if near enough to be a plausible typo: a case
 * change, or at most one edit per three characters. Earlier candidates win ties.
 */
export function nearestName(name: string, candidates: readonly string[]): string | null {
  let best: string | null = null;
  let bestDistance = Infinity;
  for (const candidate of candidates) {
    if (candidate === name) continue;
    const distance = candidate.toLowerCase() === name.toLowerCase() ? 0.5 : editDistance(name, candidate);
    if (distance < bestDistance) {
      best = candidate;
      bestDistance = distance;
    }
  }
  const allowed = Math.max(1, Math.floor(name.length / 3));
  return best !== null && bestDistance <= allowed ? best : null;
}

export function didYouMean(name: string, candidates: readonly string[]): string[] {
  const suggestion = nearestName(name, candidates);
  return suggestion === null ? [] : [`did you mean '${suggestion}'?`];
}
