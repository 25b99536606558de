import { formatDistance } from "@/lib/rig-form/format";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import { linearScale } from "@/components/charts/scale";
import { engineGround, type SiteGround } from "@/lib/validations/sites";

const WIDTH = 640;
const HEIGHT = 200;
const PAD = { left: 16, right: 16, top: 20, bottom: 20 };

/** The site's side view at true scale: the chord between the anchors and the ground below it. */
export function GroundChart({ spanM, heightDifferenceM, ground, units }: { spanM: number; heightDifferenceM: number; ground: SiteGround; units: UnitSystem }) {
  const points = engineGround(ground)?.points ?? [];
  const profile = points.length ? [{ xM: 0, heightM: points[0].heightM }, ...points, { xM: spanM, heightM: points[points.length - 1].heightM }] : [];
  const heights = [0, heightDifferenceM, ...profile.map((p) => p.heightM)];
  const low = Math.min(...heights);
  const high = Math.max(...heights);
  // True scale: one metre is as long across as it is up.
  const scale = Math.min((WIDTH - PAD.left - PAD.right) / spanM, (HEIGHT - PAD.top - PAD.bottom) / Math.max(high - low, 1e-9));
  const x = linearScale([0, spanM], [PAD.left, PAD.left + spanM * scale]);
  const y = linearScale([low, high], [PAD.top + (high - low) * scale, PAD.top]);
  const lowest = profile.reduce((m, p) => Math.min(m, p.heightM), Infinity);
  const description = profile.length
    ? `Side view at true scale: span ${formatDistance(spanM, units)}, B ${formatDistance(heightDifferenceM, units)} above A, the ground at its lowest ${formatDistance(-lowest, units)} below A.`
    : `Side view at true scale: span ${formatDistance(spanM, units)}, B ${formatDistance(heightDifferenceM, units)} above A; no ground given.`;
  return (
    <figure>
      <svg viewBox={`0 0 ${WIDTH} ${PAD.top + (high - low) * scale + PAD.bottom}`} className="h-auto w-full max-w-2xl" role="img" aria-label={description}>
        {profile.length ? (
          <polygon
            points={[...profile.map((p) => `${x(p.xM)},${y(p.heightM)}`), `${x(spanM)},${y(low) + PAD.bottom}`, `${x(0)},${y(low) + PAD.bottom}`].join(" ")}
            className="fill-ink-200 stroke-ink-500"
          />
        ) : null}
        <line x1={x(0)} y1={y(0)} x2={x(spanM)} y2={y(heightDifferenceM)} strokeDasharray="4 4" className="stroke-spruce-700" strokeWidth={2} />
        <rect x={x(0) - 5} y={y(0) - 5} width={10} height={10} className="fill-caution-800" />
        <rect x={x(spanM) - 5} y={y(heightDifferenceM) - 5} width={10} height={10} className="fill-caution-800" />
      </svg>
      <figcaption className="text-sm text-ink-700">{description}</figcaption>
    </figure>
  );
}
