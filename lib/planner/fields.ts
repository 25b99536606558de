import type { QuantityKind, UnitSystem } from "@/lib/rig-form/quantities";

// Every input of a rig by its path in the engine's input, with the words the planner's form labels it
// by and what kind of quantity it holds. Form labels, error messages, revision differences and the 409
// comparison all read this one table, so a person always meets a field under the same name.

export type FieldKind = QuantityKind | "text" | "choice" | "list" | "pick" | "flag";

interface FieldEntry {
  pattern: RegExp;
  label: (match: string[], units: UnitSystem) => string;
  kind: FieldKind;
}

const side = (letter: string) => `Anchor ${letter.toUpperCase()}`;
const ordinal = (i: number) => String(i + 1);

type Row = [RegExp, (m: string[], units: UnitSystem) => string, FieldKind];

function line(prefix: "mainline" | "backup", title: string): Row[] {
  return [
    [new RegExp(`^${prefix}$`), () => title, "list"],
    [new RegExp(`^${prefix}\\.modelId$`), () => `${title} from the Kit`, "pick"],
    [new RegExp(`^${prefix}\\.name$`), () => `${title} webbing`, "text"],
    [new RegExp(`^${prefix}\\.massPerMetreKg$`), (_m, units) => `${title} mass per ${units === "us" ? "foot" : "metre"}`, "massPerLength"],
    [new RegExp(`^${prefix}\\.mbsN$`), () => `${title} MBS`, "force"],
    [new RegExp(`^${prefix}\\.stretchPoints$`), () => `${title} stretch points`, "list"],
    [new RegExp(`^${prefix}\\.stretchPoints\\.(\\d+)$`), (m) => `${title} stretch point ${ordinal(+m[1])}`, "list"],
    [new RegExp(`^${prefix}\\.stretchPoints\\.(\\d+)\\.tensionKN$`), (m) => `${title} stretch point ${ordinal(+m[1])} tension`, "stretchTension"],
    [new RegExp(`^${prefix}\\.stretchPoints\\.(\\d+)\\.elongationPct$`), (m) => `${title} stretch point ${ordinal(+m[1])} elongation (%)`, "plain"],
  ];
}

const TABLE: Row[] = [
  [/^name$/, () => "Rig name", "text"],
  [/^spanM$/, () => "Horizontal span A to B", "length"],
  [/^heightDifferenceM$/, () => "Height of B above A", "length"],
  [/^ground\.points\.(\d+)\.xM$/, (m) => `Ground point ${ordinal(+m[1])} distance from A`, "length"],
  [/^ground\.points\.(\d+)\.heightM$/, (m) => `Ground point ${ordinal(+m[1])} height`, "length"],
  [/^ground(\..*)?$/, () => "Ground under the line", "list"],
  ...line("mainline", "Mainline"),
  ...line("backup", "Backup"),
  [/^backup\.ridesAlong$/, () => "The backup rides along the mainline", "flag"],
  [/^backup\.slackM$/, () => "Backup slack", "length"],
  [/^pretension$/, () => "Pretension", "list"],
  [/^pretension\.forceN$/, () => "Pretension, nobody on the line", "force"],
  [/^pretension\.readAt$/, () => "Pretension read at", "choice"],
  [/^walker$/, () => "Walker", "list"],
  [/^walker\.massKg$/, () => "Walker mass", "mass"],
  [/^walker\.positionFraction$/, () => "Walker position from A, share of the span", "fraction"],
  [/^walker\.positionM$/, () => "Walker position from A", "length"],
  [/^leashFall$/, () => "Leash fall", "list"],
  [/^leashFall\.leashLengthM$/, () => "Leash length", "length"],
  [/^leashFall\.harnessHeightM$/, () => "Harness height above the line", "length"],
  [/^leashFall\.fallHeightM$/, () => "Free-fall height", "length"],
  [/^leashFall\.positionFraction$/, () => "Fall position from A, share of the span", "fraction"],
  [/^leashFall\.hangBelowTieInM$/, () => "Body below the tie-in when caught", "length"],
  [/^anchors\.([ab])\.layout(\.kind)?$/, (m) => `${side(m[1])} layout`, "choice"],
  [/^anchors\.([ab])\.layout\.includedAngleDeg$/, (m) => `${side(m[1])} bridle included angle (°)`, "plain"],
  [/^anchors\.([ab])\.components$/, (m) => `${side(m[1])} components`, "list"],
  [/^anchors\.([ab])\.components\.(\d+)$/, (m) => `${side(m[1])} component ${ordinal(+m[2])}`, "list"],
  [/^anchors\.([ab])\.components\.(\d+)\.modelId$/, (m) => `${side(m[1])} component ${ordinal(+m[2])} from the Kit`, "pick"],
  [/^anchors\.([ab])\.components\.(\d+)\.name$/, (m) => `${side(m[1])} component ${ordinal(+m[2])}`, "text"],
  [/^anchors\.([ab])\.components\.(\d+)\.category$/, (m) => `${side(m[1])} component ${ordinal(+m[2])} kind`, "choice"],
  [/^anchors\.([ab])\.components\.(\d+)\.mbsN$/, (m) => `${side(m[1])} component ${ordinal(+m[2])} MBS`, "force"],
  [/^anchors\.([ab])\.components\.(\d+)\.carries$/, (m) => `${side(m[1])} component ${ordinal(+m[2])} carries`, "choice"],
  [/^tensioning\.stages$/, () => "Tensioning stages", "list"],
  [/^tensioning\.stages\.(\d+)(\.ratio)?$/, (m) => `Stage ${ordinal(+m[1])}, n of n:1`, "plain"],
  [/^tensioning\.pulleyModelId$/, () => "Pulleys from the Kit", "pick"],
  [/^tensioning\.sheaveEfficiency$/, () => "Sheave efficiency", "fraction"],
  [/^tensioning\.pullPerPersonN$/, () => "Pull per person", "force"],
  [/^tensioning\.brake(\.on)?$/, () => "Where the brake holds", "choice"],
  [/^tensioning\.brake\.stage$/, () => "Where the brake holds", "choice"],
  [/^brake\.modelId$/, () => "Brake from the Kit", "pick"],
  [/^brake\.device$/, () => "Brake device", "text"],
  [/^brake\.ropeModelId$/, () => "Brake rope from the Kit", "pick"],
  [/^brake\.ropeDiameterMm$/, () => "Rope diameter (mm)", "plain"],
  [/^slipBench$/, () => "Typed slip results", "list"],
  [/^slipBench\.(\d+)$/, (m) => `Slip result ${ordinal(+m[1])}`, "list"],
  [/^slipBench\.(\d+)\.device$/, (m) => `Slip result ${ordinal(+m[1])} device`, "text"],
  [/^slipBench\.(\d+)\.ropeDiameterMm$/, (m) => `Slip result ${ordinal(+m[1])} rope diameter (mm)`, "plain"],
  [/^slipBench\.(\d+)\.result$/, (m) => `Slip result ${ordinal(+m[1])} outcome`, "choice"],
  [/^slipBench\.(\d+)\.forceN$/, (m) => `Slip result ${ordinal(+m[1])} force`, "force"],
  [/^minimumSafetyFactors\.webbing$/, () => "Minimum for webbing", "plain"],
  [/^minimumSafetyFactors\.connector$/, () => "Minimum for connectors", "plain"],
  [/^minimumSafetyFactors\.sling$/, () => "Minimum for slings", "plain"],
  [/^minimumSafetyFactors\.anchor$/, () => "Minimum for anchors", "plain"],
  [/^minimumSafetyFactors\.other$/, () => "Minimum for other gear (rope, pulleys, brake)", "plain"],
  [/^minimumSafetyFactors(\..*)?$/, () => "Minimum safety factors", "list"],
  [/^minimumBrakeMargin$/, () => "Minimum brake margin (lowest slip ÷ force at the brake)", "plain"],
  [/^minimumClearanceM$/, () => "Minimum clearance below a fall", "length"],
];

const ENTRIES: FieldEntry[] = TABLE.map(([pattern, label, kind]) => ({ pattern, label, kind }));

function entryOf(path: string): { entry: FieldEntry; match: string[] } | null {
  for (const entry of ENTRIES) {
    const match = entry.pattern.exec(path);
    if (match) return { entry, match: [...match] };
  }
  return null;
}

/**
 * The words the form labels a field by, for any path into the rig's input; the nearest labelled group for an unlisted
 * one. Only a mass per length is named by its units ("per foot" in oz/ft); every other label reads alike in both.
 */
export function labelOf(path: string, units: UnitSystem = "si"): string {
  const parts = path.split(".");
  for (let n = parts.length; n > 0; n--) {
    const found = entryOf(parts.slice(0, n).join("."));
    if (found) return found.entry.label(found.match, units);
  }
  return "The rig's input";
}

/** What kind of value a path holds, for showing it in the crew's units. */
export function kindOf(path: string): FieldKind {
  return entryOf(path)?.entry.kind ?? "text";
}
