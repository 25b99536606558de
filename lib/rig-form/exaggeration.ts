/**
 * The vertical exaggeration that lets a line's sag be seen in a side view: the largest of 1, 2, 5,
 * 10, 20, 50… that keeps a drop of `depth` (drawn at `pixelsPerUnit`) within `room` pixels. Never below 1.
 */
export function verticalExaggeration(depth: number, pixelsPerUnit: number, room: number): number {
  const fits = room / (depth * pixelsPerUnit);
  if (!(fits > 1) || !Number.isFinite(fits)) return 1;
  const power = 10 ** Math.floor(Math.log10(fits));
  return [5, 2, 1].map((m) => m * power).find((step) => step <= fits) ?? 1;
}
