import fs from "node:fs";
import { describe, expect, it } from "vitest";
import { unit } from "mathjs";
import example from "@/physics/examples/quarry-highline.json";
import { CAUTIONS, capacityText, evaluateRig, loadText, type RigResult } from "@/physics";
import { rigCardContent, type RigCardContent, type RigCardSource } from "@/lib/rig-card/content";
import { drawableText, isDrawn } from "@/lib/rig-card/glyphs";
import { formatDepth, formatDistance, formatQuantity } from "@/lib/rig-form/format";

const result = evaluateRig(example);
const revision = {
  number: 2,
  state: "draft" as const,
  authorName: "Sol Varga",
  createdAt: "2026-12-01T09:30:00.000Z",
  engineVersion: result.engineVersion,
  inputs: example as Record<string, unknown>,
  result,
};
const signOff = {
  signedByName: "Idris Lund",
  signedAt: "2026-12-01T10:05:00.000Z",
  statement: "I have checked this revision.",
  contentHash: "0123456789abcdef0123456789abcdef0123456789abcdef0123456789abcdef",
  engineVersion: result.engineVersion,
  revisionNumber: 2,
};
const base: RigCardSource = {
  rigName: "Foxglove gap",
  siteName: "Foxglove Quarry",
  revision,
  signOff: null,
  standing: null,
  units: "si",
  rigUrl: "http://127.0.0.1:3000/rigs/r?revision=v",
};

const card = (over: Partial<RigCardSource> = {}) => rigCardContent({ ...base, ...over });
const rowsOf = (content: RigCardContent) => Object.fromEntries(content.sections.flatMap((s) => s.rows.map((r) => [r.label, r.value])));
/** Every string the card will print. */
const textsOf = (content: RigCardContent): string[] =>
  JSON.stringify(content)
    .match(/"(?:[^"\\]|\\.)*"/g)!
    .map((s) => JSON.parse(s) as string);

describe("the rig card's content", () => {
  it("says NOT SIGNED OFF when this revision has no sign-off, and which revision is signed off", () => {
    expect(card().status).toMatchObject({ signedOff: false, heading: "NOT SIGNED OFF", rows: [] });
    expect(card().status.detail).toMatch(/Revision 2 is draft\. No revision of this rig is signed off\./);
    expect(card({ standing: { ...signOff, revisionNumber: 1 } }).status.detail).toMatch(/Revision 1 of this rig is signed off/);
  });

  it("shows the sign-off: who, when, the hash's first 16 hex digits and the engine", () => {
    const { status } = card({ revision: { ...revision, state: "signed_off" }, signOff, standing: signOff });
    expect(status.signedOff).toBe(true);
    expect(status.heading).toBe("SIGNED OFF");
    expect(Object.fromEntries(status.rows.map((r) => [r.label, r.value]))).toMatchObject({
      "Signed off by": "Idris Lund",
      "Signed off at": "2026-12-01 10:05 UTC",
      "Content hash (SHA-256, first 16 hex digits)": "0123456789abcdef",
      "Engine version": result.engineVersion,
    });
  });

  it("says a superseded revision is superseded and which one stands", () => {
    const { status } = card({ revision: { ...revision, state: "superseded" }, signOff, standing: { ...signOff, revisionNumber: 3 } });
    expect(status.signedOff).toBe(false);
    expect(status.heading).toBe("SUPERSEDED — revision 3 is signed off");
    expect(status.rows[0]).toEqual({ label: "Was signed off by", value: "Idris Lund" });
  });

  it("gives the planner page's figures in SI units, through its formatters", () => {
    const rows = rowsOf(card());
    expect(rows["Pretension target, nobody on the line"]).toBe("3.50 kN at anchor B");
    expect(rows["Worst walking tension"]).toBe(loadText(Math.max(result.sweep.worstTensionA.tensionA, result.sweep.worstTensionB.tensionB), "si"));
    expect(rows["Deepest walker sag"]).toBe(formatDepth(result.sweep.deepestSag.sag, "si"));
    expect(rows["Leash-fall peak anchor load (upper bound)"]).toBe(loadText(result.leashFall.peakAnchorLoadN, "si"));
    expect(rows["Anchor A each bridle leg (60° bridle), peak"]).toBe(loadText(result.anchors.a.leg, "si"));
    expect(rows["Highest line tension the brake holds"]).toBe(capacityText(result.brake.highestLineTensionHeld!, "si"));
    expect(rows["Pulley system"]).toBe("3:1 on 2:1, compound; sheaves 92 %");
    expect(rows["Mechanical advantage, ideal / while hauling"]).toMatch(/^6:1 \/ \d\.\d\d:1$/);
    // A 60° bridle puts T / (2 cos 30°) = 0.577 T on each leg (sling-angle tables of rigging practice).
    expect(result.anchors.a.leg / result.anchors.a.masterPoint).toBeCloseTo(1 / Math.sqrt(3), 6);
  });

  it("gives the same figures in US units", () => {
    const rows = rowsOf(card({ units: "us" }));
    // 3500 N = 786.8 lbf, rounded up (NIST SP 811: 1 lbf = 4.448 221 615 260 5 N; mathjs units as the reference).
    expect(unit(3500, "N").toNumber("lbf")).toBeCloseTo(786.83, 2);
    expect(rows["Pretension target, nobody on the line"]).toBe("787 lbf at anchor B");
    // 120 m = 393.7 ft (1 ft = 0.3048 m exactly, NIST SP 811).
    expect(rows["Span"]).toBe(`${unit(120, "m").toNumber("ft").toFixed(1)} ft`);
    expect(rows["Worst walking tension"]).toBe(loadText(Math.max(result.sweep.worstTensionA.tensionA, result.sweep.worstTensionB.tensionB), "us"));
    const components = card({ units: "us" }).components;
    expect(components).toHaveLength(result.safetyFactors.length);
    result.safetyFactors.forEach((f, i) => {
      expect(components[i]).toMatchObject({ name: f.name, factor: f.shown, mbs: capacityText(f.mbs, "us"), peakLoad: loadText(f.peakLoad, "us") });
      expect(components[i].result).toBe(f.passes ? "Passes" : "Fails");
    });
  });

  it("gives the lowest clearance over the span against the crew's minimum, and the rule of thumb beside it", () => {
    const ground = {
      points: [
        { xM: 0, heightM: -30 },
        { xM: 60, heightM: -40 },
        { xM: 120, heightM: -30 },
      ],
    };
    const onGround = evaluateRig({ ...example, ground });
    const rows = rowsOf(card({ revision: { ...revision, inputs: { ...example, ground }, result: onGround } }));
    const lowest = onGround.clearance.leashFall!;
    expect(rows["Lowest clearance over the span, leash fall"]).toBe(
      `${formatQuantity(lowest.clearanceM, "length", "si", "down")} at ${formatDistance(lowest.positionM, "si")} from A`,
    );
    expect(rows["Crew's minimum clearance"]).toBe("2.00 m");
    // A highline at least a third of its length plus 3 m above the ground (Swiss Slackline Association, 2014): 120 m / 3 + 3 m = 43 m.
    const rule = Object.entries(rows).find(([label]) => label.startsWith("Rule of thumb"))!;
    expect(rule[1]).toMatch(/; rule at least 43\.00 m$/);
    expect(rule[0]).toContain("Swiss Slackline Association");
  });

  it("carries every caution of the result", () => {
    expect(card().cautions).toEqual(CAUTIONS);
  });

  it("reads clearance and backup catch as not computed for a result without them, and shows them when there", () => {
    // A revision saved by engine 1.0.0 has none of the clearance and backup-catch figures.
    const older = structuredClone(result) as Omit<Partial<RigResult>, "leashFall"> & { leashFall: Partial<RigResult["leashFall"]> };
    delete older.backupCatch;
    delete older.backupCatchMissing;
    delete older.clearance;
    delete older.leashFall.lowestPointM;
    delete older.leashFall.groundClearanceM;
    const rows = rowsOf(card({ revision: { ...revision, result: older as unknown as RigResult } }));
    expect(rows["Ground clearance after a leash fall"]).toBe("not computed");
    expect(rows["Backup catch"]).toBe("not computed");

    const withCatch = {
      ...result,
      leashFall: { ...result.leashFall, lowestPointM: -6.2, groundClearanceM: null },
      backupCatch: { peakLoadN: 9100, peakAnchorLoadN: 15001, fallHeightM: 4, lowestPointM: -12, groundClearanceM: 20.019 },
      clearance: { groundGiven: false },
    } as RigResult;
    const later = rowsOf(card({ revision: { ...revision, result: withCatch } }));
    expect(later["Ground clearance after a leash fall"]).toBe("no ground given");
    expect(later["Backup-catch peak anchor load (upper bound)"]).toBe("15.01 kN");
    // A clearance is cut down: 20.019 m reads 20.01 m, never 20.02 m.
    expect(later["Ground clearance after a backup catch"]).toBe("20.01 m");

    const noBackup = { ...result, backupCatch: null, backupCatchMissing: "No backup given: its catch is not worked out." } as RigResult;
    expect(rowsOf(card({ revision: { ...revision, result: noBackup } }))["Backup catch"]).toBe("No backup given: its catch is not worked out.");
  });

  // The subset's coverage as the font package states it (@fontsource/inter, 400.css: the latin block's unicode-range).
  const css = fs.readFileSync("node_modules/@fontsource/inter/400.css", "utf8");
  const ranges = css
    .match(/inter-latin-400-normal\.woff2[^}]*unicode-range:\s*([^;]+);/)![1]
    .split(",")
    .map((r) =>
      r
        .trim()
        .slice(2)
        .split("-")
        .map((h) => parseInt(h, 16)),
    )
    .map(([from, to]) => [from, to ?? from]);
  const drawn = (c: string) => ranges.some(([from, to]) => c.codePointAt(0)! >= from && c.codePointAt(0)! <= to);

  it("knows which characters the shipped font draws, as the font package states them", () => {
    for (let code = 0; code <= 0xffff; code++) {
      if (code >= 0xd800 && code <= 0xdfff) continue;
      const c = String.fromCodePoint(code);
      if (isDrawn(c) !== drawn(c)) expect.fail(`U+${code.toString(16)}: isDrawn ${isDrawn(c)}, the font package ${drawn(c)}`);
    }
    expect(drawableText("Łódź, Špičák, Ελλάδα")).toEqual({ text: "Lódz, Spicák, ??????", changed: true });
    expect(drawableText("Foxglove gap — revision 2")).toEqual({ text: "Foxglove gap — revision 2", changed: false });
  });

  it("writes only characters the shipped Inter latin subset draws", () => {
    for (const units of ["si", "us"] as const) {
      for (const state of ["draft", "superseded", "signed_off"] as const) {
        const content = card({ units, revision: { ...revision, state }, signOff, standing: { ...signOff, revisionNumber: 3 } });
        const missing = textsOf(content).flatMap((t) => [...t].filter((c) => !drawn(c)));
        expect(missing, `${units} ${state}`).toEqual([]);
      }
    }
  });
});
