import { fixedDigits } from "@/physics";

/** A linear map from a data interval onto a pixel interval. */
export function linearScale(domain: [number, number], range: [number, number]) {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  const span = d1 - d0 || 1;
  return (value: number) => r0 + ((value - d0) / span) * (r1 - r0);
}

/** An axis tick: its value, and its text with as many decimals as the step between ticks needs. */
export interface Tick {
  value: number;
  text: string;
}

/**
 * Round ticks (1, 2 or 5 times a power of ten apart) covering [min, max], about `count` of them. Each tick
 * is an integer count of steps times the step's integer mantissa, scaled by an exact power of ten, so no
 * float noise builds up from tick to tick (0.3, never 0.30000000000000004), and zero is never "-0".
 */
export function axisTicks(min: number, max: number, count = 5): Tick[] {
  if (!Number.isFinite(min) || !Number.isFinite(max)) return [];
  if (!(max > min)) return [{ value: min, text: tickText(min, 0) }];
  const raw = (max - min) / count;
  let power = Math.floor(Math.log10(raw));
  let mantissa = [1, 2, 5, 10].find((m) => m * 10 ** power >= raw * (1 - 1e-12)) ?? 10;
  if (mantissa === 10) [mantissa, power] = [1, power + 1];
  // value(k) = k·mantissa·10^power, computed as an integer times or divided by an exact power of ten.
  const value = (k: number) => (power >= 0 ? k * mantissa * 10 ** power : (k * mantissa) / 10 ** -power);
  const step = value(1);
  const decimals = Math.max(0, -power);
  const ticks: Tick[] = [];
  for (let k = Math.ceil(min / step - 1e-9); value(k) <= max + step * 1e-9; k++) ticks.push({ value: value(k) || 0, text: tickText(value(k), decimals) });
  return ticks;
}

/** A tick's text at a fixed number of decimals, as every figure is written (physics/display.ts); zero never reads "-0". */
const tickText = (value: number, decimals: number) => fixedDigits(value, decimals, "nearest");
