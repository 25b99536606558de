/**
 * The vertical scale that lets a side view show both the line's sag and what lies under it: the
 * largest of …0.1, 0.2, 0.5, 1, 2, 5, 10… that keeps a drop of `depth` (drawn at `pixelsPerUnit`)
 * within `room` pixels. Above 1 the heights are exaggerated (a shallow sag is seen); below 1 they are
 * compressed (a deep gorge fits). 1 when there is no depth to show.
 */
export function verticalExaggeration(depth: number, pixelsPerUnit: number, room: number): number {
  const fits = room / (depth * pixelsPerUnit);
  if (!(fits > 0) || !Number.isFinite(fits)) return 1;
  const power = 10 ** Math.floor(Math.log10(fits));
  // Rounded to 12 digits so that 10 ** -1 times 2 reads 0.2, not 0.20000000000000004.
  return [5, 2, 1].map((m) => Number((m * power).toPrecision(12))).find((step) => step <= fits) ?? power;
}
