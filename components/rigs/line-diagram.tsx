"use client";

import { useEffect, useRef, useState } from "react";
import { Circle, Group, Layer, Line, Rect, Stage, Text } from "react-konva";
import { formatDepth, formatDistance } from "@/lib/rig-form/format";
import { verticalExaggeration } from "@/lib/rig-form/exaggeration";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import type { RigResult } from "@/physics";

const HEIGHT = 260;
const PAD = { left: 28, right: 28, top: 56, bottom: 36 };
// The product's ink, spruce and caution tokens (tailwind.config.ts), for a canvas that cannot read classes.
const INK = "#111822";
const MUTED = "#4d5d71";
const LOADED = "#11573d";
const ANCHOR = "#5c3d00";

/** Width of the element, following it as the window changes. */
function useWidth() {
  const ref = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(0);
  useEffect(() => {
    const element = ref.current;
    if (!element) return;
    const observer = new ResizeObserver(([entry]) => setWidth(Math.floor(entry.contentRect.width)));
    observer.observe(element);
    return () => observer.disconnect();
  }, []);
  return { ref, width };
}

/** Side view of the line: unloaded and with the walker, anchors at both ends, heights exaggerated as stated. */
export function LineDiagram({ result, units }: { result: RigResult; units: UnitSystem }) {
  const { ref, width } = useWidth();
  const { unloaded, walker } = result;
  const all = [...unloaded.profile, ...walker.profile];
  const span = all.reduce((m, p) => Math.max(m, p.x), 0);
  const top = all.reduce((m, p) => Math.max(m, p.y), 0);
  const bottom = all.reduce((m, p) => Math.min(m, p.y), 0);
  const pixelsPerMetre = (width - PAD.left - PAD.right) / span;
  const exaggeration = verticalExaggeration(top - bottom, pixelsPerMetre, HEIGHT - PAD.top - PAD.bottom);
  const px = (x: number) => PAD.left + x * pixelsPerMetre;
  const py = (y: number) => PAD.top + (top - y) * pixelsPerMetre * exaggeration;
  const points = (profile: { x: number; y: number }[]) => profile.flatMap((p) => [px(p.x), py(p.y)]);
  const end = unloaded.profile[unloaded.profile.length - 1];
  const walkerY = (end.y * walker.positionM) / end.x - walker.sagAtWalkerM;
  const description = `Side view: span ${formatDistance(span, units)}, B ${formatDistance(end.y, units)} above A. Unloaded mid-span sag ${formatDepth(
    unloaded.midSpanSagM,
    units,
  )}; with the walker at ${formatDistance(walker.positionM, units)} the sag is ${formatDepth(walker.sagAtWalkerM, units)}. Heights drawn ×${exaggeration}.`;
  return (
    <figure>
      <div ref={ref} role="img" aria-label={description} className="w-full">
        {width > 0 ? (
          <Stage width={width} height={HEIGHT}>
            <Layer>
              <Text
                x={8}
                y={8}
                width={width - 16}
                wrap="word"
                text={
                  exaggeration === 1
                    ? "True scale: heights not exaggerated"
                    : `Vertical exaggeration ×${exaggeration}: heights drawn ${exaggeration} times their scale`
                }
                fontSize={14}
                fontStyle="bold"
                fill={INK}
              />
              <Line points={[px(0), py(0), px(end.x), py(end.y)]} stroke={MUTED} strokeWidth={1} dash={[2, 6]} />
              <Line points={points(unloaded.profile)} stroke={MUTED} strokeWidth={2} dash={[10, 6]} />
              <Line points={points(walker.profile)} stroke={LOADED} strokeWidth={3} />
              <Circle x={px(walker.positionM)} y={py(walkerY)} radius={7} fill={LOADED} stroke="#ffffff" strokeWidth={2} />
              {[
                { x: 0, y: 0, label: "A" },
                { x: end.x, y: end.y, label: "B" },
              ].map((a) => (
                <Group key={a.label}>
                  <Rect x={px(a.x) - 7} y={py(a.y) - 7} width={14} height={14} fill={ANCHOR} />
                  <Text x={px(a.x) - 5} y={py(a.y) + 12} text={a.label} fontSize={16} fontStyle="bold" fill={INK} />
                </Group>
              ))}
              <Text x={px(walker.positionM) + 10} y={py(walkerY) + 4} text="Walker" fontSize={14} fill={LOADED} />
            </Layer>
          </Stage>
        ) : (
          <div style={{ height: HEIGHT }} />
        )}
      </div>
      <figcaption className="mt-2 flex flex-wrap gap-x-6 gap-y-1 text-sm text-ink-700">
        <span>
          <span aria-hidden="true" className="mr-1 inline-block w-8 border-t-2 border-dashed border-ink-500 align-middle" />
          Unloaded (dashed)
        </span>
        <span>
          <span aria-hidden="true" className="mr-1 inline-block w-8 border-t-[3px] border-spruce-700 align-middle" />
          With the walker (solid)
        </span>
        <span>Dotted: the chord A–B. Heights ×{exaggeration}.</span>
      </figcaption>
    </figure>
  );
}
