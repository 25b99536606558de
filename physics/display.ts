// Figures written into messages lean to the safe side: a load is rounded up, a capacity, margin or
// safety factor is cut down, so no text ever shows more reserve than there is.

/** A load, rounded up to `decimals` places. */
export function roundUp(value: number, decimals = 2): string {
  const scale = 10 ** decimals;
  return (Math.ceil(value * scale) / scale).toFixed(decimals);
}

/**
 * A capacity, margin or factor, cut down to `decimals` places (never rounded up). No correction for
 * binary fractions on purpose: 0.29 may read 0.28, one step low, but a factor just below 3 never reads 3.00.
 */
export function cutDown(value: number, decimals = 2): string {
  const scale = 10 ** decimals;
  return (Math.floor(value * scale) / scale).toFixed(decimals);
}
