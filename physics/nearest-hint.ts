/**
 * Starting points kept by position along the span: a search over fall positions starts each new catch from the one
 * already solved nearest to it (a tie goes to the one added first). A start saves iterations; it never changes a figure.
 */
export function nearestHints<T>() {
  const known: { x: number; hint: T }[] = [];
  return {
    add: (x: number, hint: T) => void known.push({ x, hint }),
    nearest: (x: number) => known.reduce<{ x: number; hint: T } | undefined>((a, b) => (a && Math.abs(a.x - x) <= Math.abs(b.x - x) ? a : b), undefined)?.hint,
  };
}
