"use client";

import { loadText } from "@/physics";
import { useEffect, useLayoutEffect, useRef, useState, type KeyboardEvent } from "react";
import { Circle, Group, Layer, Line, Rect, Stage, Text } from "react-konva";
import type { KonvaEventObject } from "konva/lib/Node";
import { formatDepth, formatDistance } from "@/lib/rig-form/format";
import { verticalExaggeration } from "@/lib/rig-form/exaggeration";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import type { RigResult } from "@/physics";

const HEIGHT = 230;
const PAD = { left: 30, right: 30, top: 60, bottom: 24 };
// The product's ink, spruce and caution tokens (tailwind.config.ts), for a canvas that cannot read classes.
const INK = "#111822";
const MUTED = "#4d5d71";
const LOADED = "#11573d";
const ANCHOR = "#5c3d00";
const GROUND = "#cbd3dc";
const FALL = "#5c3d00";
const CATCH = "#8f1d14";

/** The walker may be dragged between 1 % and 99 % of the span: at an anchor the line cannot deflect. */
export const WALKER_RANGE = { min: 0.01, max: 0.99 } as const;
const clampWalker = (f: number) => Math.min(WALKER_RANGE.max, Math.max(WALKER_RANGE.min, Math.round(f * 1000) / 1000));

// Keys that move the walker, by how much of the span (common slider practice: arrows a small step, Page keys a large one).
const KEY_STEPS: Record<string, number> = { ArrowLeft: -0.01, ArrowDown: -0.01, ArrowRight: 0.01, ArrowUp: 0.01, PageDown: -0.1, PageUp: 0.1 };

/** Marks the start of a walker move, so the frame it causes can be measured (see tests/bench). */
const markWalkerInput = () => performance.mark("walker-input");

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

/**
 * After a walker move, how long it took from the input until the figures and the diagram were updated
 * ("walker-commit"), and until the next frame could show them ("walker-frame").
 */
function useFrameMeasure(result: RigResult) {
  useLayoutEffect(() => {
    if (performance.getEntriesByName("walker-input", "mark").length === 0) return;
    performance.measure("walker-commit", "walker-input");
    requestAnimationFrame(() => {
      performance.measure("walker-frame", "walker-input");
      performance.clearMarks("walker-input");
    });
  }, [result]);
}

/** The ground under the line from A to B: the given points, level beyond the ends. */
function groundProfile(ground: { points: { xM: number; heightM: number }[] } | undefined, span: number): { x: number; y: number }[] {
  if (!ground?.points.length) return [];
  const points = ground.points.map((p) => ({ x: p.xM, y: p.heightM }));
  return [{ x: 0, y: points[0].y }, ...points, { x: span, y: points[points.length - 1].y }];
}

/** Height of a drawn profile at x, read off its points. */
function heightOf(profile: { x: number; y: number }[], x: number): number {
  const i = Math.max(
    1,
    profile.findIndex((p) => p.x >= x),
  );
  const a = profile[i - 1];
  const b = profile[i] ?? a;
  return b.x === a.x ? a.y : a.y + ((b.y - a.y) * (x - a.x)) / (b.x - a.x);
}

interface LineDiagramProps {
  result: RigResult;
  /** The engine's input as evaluated, for the ground under the line. */
  input: Record<string, unknown>;
  units: UnitSystem;
  onWalkerMove: (fraction: number) => void;
}

/**
 * Side view of the line, unloaded and with the walker, with the tension at each anchor and the ground
 * where the site gives it. The walker is dragged with a pointer or a finger, or moved with the keyboard.
 */
export function LineDiagram({ result, input, units, onWalkerMove }: LineDiagramProps) {
  const { ref, width } = useWidth();
  const dragging = useRef(false);
  useFrameMeasure(result);
  const { unloaded, walker } = result;
  const end = unloaded.profile[unloaded.profile.length - 1];
  const span = end.x;
  const ground = groundProfile(input.ground as Parameters<typeof groundProfile>[0], span);
  // The walker's lowest point after a leash fall and after the backup's catch, hanging below where each fall began.
  // Each is drawn as a drop from the unloaded line where the fall began.
  const lowest = [
    { label: "Leash fall", positionM: result.leashFall.positionM, y: result.leashFall.lowestPointM, colour: FALL },
    { label: "Backup catch", positionM: result.backupCatch?.positionM ?? 0, y: result.backupCatch?.lowestPointM ?? null, colour: CATCH },
  ]
    .filter((m): m is { label: string; positionM: number; y: number; colour: string } => m.y !== null)
    .map((m) => ({ ...m, lineY: heightOf(unloaded.profile, m.positionM) }));
  const all = [...unloaded.profile, ...walker.profile, ...ground, ...lowest.map((m) => ({ x: m.positionM, y: m.y }))];
  const top = Math.max(...all.map((p) => p.y), 0);
  const bottom = Math.min(...all.map((p) => p.y), 0);
  const pixelsPerMetre = Math.max(width - PAD.left - PAD.right, 1) / span;
  const exaggeration = verticalExaggeration(top - bottom, pixelsPerMetre, HEIGHT - PAD.top - PAD.bottom);
  const px = (x: number) => PAD.left + x * pixelsPerMetre;
  const py = (y: number) => PAD.top + (top - y) * pixelsPerMetre * exaggeration;
  const points = (profile: { x: number; y: number }[]) => profile.flatMap((p) => [px(p.x), py(p.y)]);
  const walkerY = (end.y * walker.positionM) / end.x - walker.sagAtWalkerM;
  const fraction = walker.positionM / span;

  const moveTo = (pointerX: number) => {
    markWalkerInput();
    onWalkerMove(clampWalker((pointerX - PAD.left) / pixelsPerMetre / span));
  };
  const onPointer = (event: KonvaEventObject<PointerEvent>, phase: "down" | "move" | "up") => {
    if (phase === "down") dragging.current = true;
    if (phase === "up") dragging.current = false;
    const pointer = event.target.getStage()?.getPointerPosition();
    if (dragging.current && pointer) moveTo(pointer.x);
  };
  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    const step = KEY_STEPS[event.key];
    const to = event.key === "Home" ? WALKER_RANGE.min : event.key === "End" ? WALKER_RANGE.max : step === undefined ? null : fraction + step;
    if (to === null) return;
    event.preventDefault();
    markWalkerInput();
    onWalkerMove(clampWalker(to));
  };

  const description = `Side view: span ${formatDistance(span, units)}, B ${formatDistance(end.y, units)} above A. Unloaded mid-span sag ${formatDepth(
    unloaded.midSpanSagM,
    units,
  )}; with the walker at ${formatDistance(walker.positionM, units)} the sag is ${formatDepth(walker.sagAtWalkerM, units)}, tension at A ${loadText(
    walker.tensionAN,
    units,
  )} and at B ${loadText(walker.tensionBN, units)}.${lowest
    .map((m) => ` ${m.label} at ${formatDistance(m.positionM, units)}: the walker's lowest point at ${formatDistance(m.y, units)} relative to A.`)
    .join("")} Heights drawn ×${exaggeration}.`;
  return (
    <figure>
      <div
        ref={ref}
        role="slider"
        tabIndex={0}
        aria-label="Walker position on the side view"
        aria-valuemin={WALKER_RANGE.min * 100}
        aria-valuemax={WALKER_RANGE.max * 100}
        aria-valuenow={Math.round(fraction * 1000) / 10}
        aria-valuetext={`${formatDistance(walker.positionM, units)} from A. ${description}`}
        onKeyDown={onKeyDown}
        // Vertical swipes still scroll the page; sideways ones drag the walker.
        style={{ touchAction: "pan-y" }}
        className="w-full cursor-ew-resize rounded-control focus-visible:outline focus-visible:outline-4 focus-visible:outline-spruce-600"
      >
        {width > 0 ? (
          <Stage
            width={width}
            height={HEIGHT}
            onPointerDown={(e) => onPointer(e, "down")}
            onPointerMove={(e) => onPointer(e, "move")}
            onPointerUp={(e) => onPointer(e, "up")}
            onPointerLeave={() => (dragging.current = false)}
          >
            <Layer listening>
              <Rect x={0} y={0} width={width} height={HEIGHT} fill="#ffffff" />
              <Text
                x={8}
                y={6}
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
              {ground.length ? (
                <Line points={[...points(ground), px(span), HEIGHT, px(0), HEIGHT]} closed fill={GROUND} stroke={MUTED} strokeWidth={1} />
              ) : null}
              <Line points={[px(0), py(0), px(end.x), py(end.y)]} stroke={MUTED} strokeWidth={1} dash={[2, 6]} />
              <Line points={points(unloaded.profile)} stroke={MUTED} strokeWidth={2} dash={[10, 6]} />
              <Line points={points(walker.profile)} stroke={LOADED} strokeWidth={3} />
              {lowest.map((m, i) => (
                <Group key={m.label}>
                  <Line points={[px(m.positionM), py(m.lineY), px(m.positionM), py(m.y)]} stroke={m.colour} strokeWidth={1} dash={[3, 4]} />
                  <Line points={[px(m.positionM) - 9, py(m.y), px(m.positionM) + 9, py(m.y)]} stroke={m.colour} strokeWidth={3} />
                  <Line points={[px(m.positionM), py(m.y) - 9, px(m.positionM), py(m.y) + 9]} stroke={m.colour} strokeWidth={3} />
                  <Text
                    x={px(m.positionM) + (i === 0 ? -172 : 12)}
                    y={py(m.y) - 7}
                    width={160}
                    align={i === 0 ? "right" : "left"}
                    text={`${m.label}: lowest point`}
                    fontSize={13}
                    fontStyle="bold"
                    fill={m.colour}
                  />
                </Group>
              ))}
              <Circle x={px(walker.positionM)} y={py(walkerY)} radius={11} fill={LOADED} stroke="#ffffff" strokeWidth={3} />
              <Text x={px(walker.positionM) - 40} y={py(walkerY) - 32} width={80} align="center" text="Walker" fontSize={14} fontStyle="bold" fill={LOADED} />
              {[
                { x: 0, y: 0, label: "A", tension: walker.tensionAN, align: "left" as const },
                { x: end.x, y: end.y, label: "B", tension: walker.tensionBN, align: "right" as const },
              ].map((a) => (
                <Group key={a.label}>
                  <Rect x={px(a.x) - 8} y={py(a.y) - 8} width={16} height={16} fill={ANCHOR} />
                  <Text
                    x={a.align === "left" ? 4 : width - 164}
                    y={py(a.y) - 34}
                    width={160}
                    align={a.align}
                    text={`${a.label}: ${loadText(a.tension, units)}`}
                    fontSize={15}
                    fontStyle="bold"
                    fill={INK}
                  />
                </Group>
              ))}
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
        {ground.length ? <span>Shaded: the ground under the line.</span> : null}
        {lowest.map((m) => (
          <span key={m.label} style={{ color: m.colour }} className="font-semibold">
            + {m.label}: the walker&apos;s lowest point
          </span>
        ))}
        <span>Figures at A and B: the tension with the walker where it is. Drag the walker, or focus the view and use the arrow and Page keys.</span>
      </figcaption>
    </figure>
  );
}
