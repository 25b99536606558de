import { capacityText, factorText, loadText, parseRigInput, type RigResult, type SafetyFactor } from "@/physics";
import type { Revision } from "@/db/rigs";
import type { SignOff } from "@/db/reviews";
import { BRAKE_VERDICTS } from "@/components/rigs/verdict-words";
import { efficiencyText, ropeDiameterText, asGiven } from "@/lib/figures";
import { formatDepth, formatDistance, formatQuantity } from "@/lib/rig-form/format";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import { REVISION_STATE_LABELS } from "@/lib/validations/rigs";

// The rig card's words and figures, made once for both the PDF and the print page, so a figure reads the
// same on the card as on the planner page: every figure goes through the planner's formatters.
// Only characters of the shipped Inter latin subset are written here (no ≥, ≤ or arrows): the PDF has no others.

export interface CardRow {
  label: string;
  value: string;
  /** A check that fails or is not known to pass: set in bold on the card. */
  alert?: boolean;
}

export interface CardSection {
  title: string;
  note?: string;
  rows: CardRow[];
}

/** One component in the load path, every cell already worded. */
export interface CardComponent {
  name: string;
  where: string;
  factor: string;
  minimum: string;
  result: "Passes" | "Fails";
  mbs: string;
  peakLoad: string;
}

export interface RigCardContent {
  rigName: string;
  /** Site, revision, author and date, in one line. */
  about: string;
  status: {
    signedOff: boolean;
    /** "SIGNED OFF", "NOT SIGNED OFF" or "SUPERSEDED — revision N is signed off". */
    heading: string;
    detail: string;
    /** Who signed, when, the content hash's first 16 hex digits, the engine: empty when nobody signed this revision. */
    rows: CardRow[];
  };
  sections: CardSection[];
  components: CardComponent[];
  cautions: readonly string[];
  rigUrl: string;
  /** How the figures are rounded and where they come from. */
  footer: string;
}

type CardRevision = Pick<Revision, "number" | "state" | "authorName" | "createdAt" | "engineVersion" | "inputs" | "result">;
type CardSignOff = Pick<SignOff, "signedByName" | "signedAt" | "statement" | "contentHash" | "engineVersion" | "revisionNumber">;

export interface RigCardSource {
  rigName: string;
  siteName: string | null;
  revision: CardRevision;
  /** The sign-off of this very revision, or null. */
  signOff: CardSignOff | null;
  /** The sign-off that stands for the rig now (perhaps of another revision), or null. */
  standing: CardSignOff | null;
  units: UnitSystem;
  rigUrl: string;
}

/** A moment as the card prints it: unambiguous on paper, whatever the reader's time zone. */
export const cardTime = (at: string | Date) => `${new Date(at).toISOString().slice(0, 16).replace("T", " ")} UTC`;

/**
 * Figures engine 1.1.0 added to the result (ground clearance, the backup's catch). A revision saved by an
 * earlier engine has none, so each is read as possibly missing: undefined is "not computed", null "does not apply".
 */
type LaterFields = "backupCatch" | "backupCatchMissing" | "clearance";
type LaterFallFields = "lowestPointM" | "groundClearanceM";
type ClearanceFigures = Partial<Pick<RigResult["leashFall"], LaterFallFields>>;
type StoredResult = Omit<RigResult, LaterFields | "leashFall"> &
  Partial<Pick<RigResult, LaterFields>> & { leashFall: Omit<RigResult["leashFall"], LaterFallFields> & ClearanceFigures };
type LowestClearance = RigResult["clearance"]["leashFall"];

function laterFigures(result: StoredResult) {
  return {
    leashFall: result.leashFall,
    backupCatch: result.backupCatch,
    backupMissing: result.backupCatchMissing,
    groundGiven: result.clearance?.groundGiven,
    clearance: result.clearance,
  };
}

/** The lowest clearance over fall positions along the span, against the crew's minimum, and the trade's rule of thumb beside it. */
function clearanceRows(clearance: StoredResult["clearance"], units: UnitSystem): CardRow[] {
  if (!clearance?.groundGiven) return [];
  const lowest = (what: string, c: LowestClearance): CardRow[] =>
    c
      ? [
          {
            label: `Lowest clearance over the span, ${what}`,
            value: `${formatClearance(c.clearanceM, units)} at ${formatDistance(c.positionM, units)} from A${c.passes ? "" : ", below the crew's minimum"}`,
            alert: !c.passes,
          },
        ]
      : [];
  const rule = clearance.ruleOfThumb;
  return [
    ...lowest("leash fall", clearance.leashFall),
    ...lowest("backup catch", clearance.backupCatch),
    { label: "Crew's minimum clearance", value: formatDistance(clearance.minimumM, units) },
    ...(rule.midSpanHeightAboveGroundM !== null
      ? [
          {
            label: `Rule of thumb, a third of the span plus 3 m (${rule.source})`,
            value: `line ${formatClearance(rule.midSpanHeightAboveGroundM, units)} above the ground at mid-span; rule at least ${formatDepth(rule.heightAboveGroundM, units)}`,
            alert: rule.midSpanHeightAboveGroundM < rule.heightAboveGroundM,
          },
        ]
      : []),
  ];
}

// A clearance is a reserve: never shown larger than computed.
const formatClearance = (metres: number, units: UnitSystem) => formatQuantity(metres, "length", units, "down");

function clearanceText(figures: ClearanceFigures, groundGiven: boolean | undefined, units: UnitSystem): string {
  if (figures.groundClearanceM === undefined) return "not computed";
  if (figures.groundClearanceM !== null) return formatClearance(figures.groundClearanceM, units);
  return groundGiven ? "not computed (no leash length given)" : "no ground given";
}

function status(source: RigCardSource): RigCardContent["status"] {
  const { revision, signOff, standing } = source;
  const state = REVISION_STATE_LABELS[revision.state].toLowerCase();
  const rows: CardRow[] = signOff
    ? [
        { label: revision.state === "superseded" ? "Was signed off by" : "Signed off by", value: signOff.signedByName },
        { label: "Signed off at", value: cardTime(signOff.signedAt) },
        { label: "Content hash (SHA-256, first 16 hex digits)", value: signOff.contentHash.slice(0, 16) },
        { label: "Engine version", value: signOff.engineVersion },
        { label: "Statement", value: signOff.statement },
      ]
    : [];
  if (revision.state === "signed_off" && signOff) {
    return { signedOff: true, heading: "SIGNED OFF", detail: `Revision ${revision.number} is the signed-off plan of this rig.`, rows };
  }
  const elsewhere =
    standing && standing.revisionNumber !== revision.number
      ? `Revision ${standing.revisionNumber} of this rig is signed off.`
      : "No revision of this rig is signed off.";
  if (revision.state === "superseded") {
    return {
      signedOff: false,
      heading: standing ? `SUPERSEDED — revision ${standing.revisionNumber} is signed off` : "SUPERSEDED",
      detail: `Revision ${revision.number} was signed off and has been replaced: do not rig from this card. ${standing ? "" : elsewhere}`.trim(),
      rows,
    };
  }
  return {
    signedOff: false,
    heading: "NOT SIGNED OFF",
    detail: `Revision ${revision.number} is ${revision.state === "signed_off" ? "marked signed off, but no sign-off is on record" : state}. ${elsewhere} Do not rig from this card before a crew lead signs it off.`,
    rows,
  };
}

const where = (f: SafetyFactor) => {
  const location: string = f.location;
  if (location === "line") return `Line, ${f.category}`;
  if (location === "a" || location === "b") return `Anchor ${location.toUpperCase()}, ${f.category}`;
  return `${location[0].toUpperCase()}${location.slice(1)}, ${f.category}`;
};

function stagesText(stages: readonly { ratio: number }[]): string {
  const each = stages.map((s) => `${s.ratio}:1`).join(" on ");
  return stages.length === 1 ? `${each}, simple` : `${each}, compound`;
}

/** The rig card for one revision: sign-off state, the figures a crew rigs by, every component's safety factor and the cautions. */
export function rigCardContent(source: RigCardSource): RigCardContent {
  const { revision, units } = source;
  const input = parseRigInput(revision.inputs);
  const result = revision.result;
  const { walker, unloaded, sweep, tensioning, brake, anchors, safetyFactors } = result;
  const later = laterFigures(result as StoredResult);
  const worstWalking = Math.max(sweep.worstTensionA.tensionA, sweep.worstTensionB.tensionB);
  const atWalker = `Walker at ${formatDistance(walker.positionM, units)} from A`;
  const atLeast = brake.lowerBoundOnly ? "at least " : "";
  const brakeWord = BRAKE_VERDICTS[brake.verdict].word;
  const failing = safetyFactors.filter((f) => !f.passes);

  const backup = later.backupCatch;
  const backupRows: CardRow[] =
    backup === undefined || backup === null
      ? [{ label: "Backup catch", value: backup === null && later.backupMissing ? later.backupMissing : "not computed" }]
      : [
          { label: "Backup-catch peak load on the backup (upper bound)", value: loadText(backup.peakLoadN, units) },
          { label: "Backup-catch peak anchor load (upper bound)", value: loadText(backup.peakAnchorLoadN, units) },
          { label: "Ground clearance after a backup catch", value: clearanceText(backup, later.groundGiven, units) },
        ];

  const anchorRows = (["a", "b"] as const).flatMap((side): CardRow[] => {
    const a = anchors[side];
    const name = `Anchor ${side.toUpperCase()}`;
    const layout = input.anchors[side].layout;
    return layout.kind === "bridle"
      ? [
          { label: `${name} master point, peak`, value: loadText(a.masterPoint, units) },
          { label: `${name} each bridle leg (${asGiven(layout.includedAngleDeg)}° bridle), peak`, value: loadText(a.leg, units) },
        ]
      : [{ label: `${name} single point, peak`, value: loadText(a.masterPoint, units) }];
  });

  const brakeOn = input.tensioning.brake.on === "tail" ? "on the crew's tail" : `on the tail of stage ${input.tensioning.brake.stage + 1}`;

  const sections: CardSection[] = [
    {
      title: "Checks",
      rows: [
        {
          label: "Safety factors",
          value:
            failing.length === 0
              ? `all ${safetyFactors.length} at or above the crew's minimums`
              : `${failing.length} below the crew's minimum: ${failing.map((f) => `${f.name} ${f.shown} (minimum ${f.minimum})`).join("; ")}`,
          alert: failing.length > 0,
        },
        { label: "Brake", value: brakeWord, alert: brake.verdict !== "holds" },
        {
          label: "Stretch curve",
          value: result.extrapolated ? "extrapolated: some tensions are beyond the last measured point" : "every tension within the measured points",
          alert: result.extrapolated,
        },
      ],
    },
    {
      title: "Line",
      rows: [
        { label: "Span", value: formatDistance(input.spanM, units) },
        { label: "Height of anchor B above A", value: formatDistance(input.heightDifferenceM, units) },
        { label: "Mainline", value: input.mainline.name },
        { label: "Backup", value: input.backup ? `${input.backup.name}${input.backup.ridesAlong ? ", rides along" : ""}` : "none given" },
        {
          label: "Pretension target, nobody on the line",
          value: `${loadText(input.pretension.forceN, units)} at anchor ${input.pretension.readAt.toUpperCase()}`,
        },
        { label: "Mid-span sag, nobody on the line", value: formatDepth(unloaded.midSpanSagM, units) },
      ],
    },
    {
      title: "Walking",
      rows: [
        { label: "Worst walking tension", value: loadText(worstWalking, units) },
        { label: "Deepest walker sag", value: formatDepth(sweep.deepestSag.sag, units) },
        { label: `${atWalker}: tension A / B`, value: `${loadText(walker.tensionAN, units)} / ${loadText(walker.tensionBN, units)}` },
        { label: "Walker's mass", value: formatQuantity(input.walker.massKg, "mass", units, "up") },
      ],
    },
    {
      title: "Falls",
      note: "Upper bounds: no damping and no give in leash or harness.",
      rows: [
        { label: "Leash-fall peak load on the line (upper bound)", value: loadText(later.leashFall.peakLoadN, units) },
        { label: "Leash-fall peak anchor load (upper bound)", value: loadText(later.leashFall.peakAnchorLoadN, units) },
        { label: "Free fall before the line takes the load", value: formatDepth(later.leashFall.fallHeightM, units) },
        { label: "Ground clearance after a leash fall", value: clearanceText(later.leashFall, later.groundGiven, units) },
        ...backupRows,
        ...clearanceRows(later.clearance, units),
      ],
    },
    { title: "Anchors (peak loads: walker anywhere or a fall)", rows: anchorRows },
    {
      title: "Tensioning and brake",
      rows: [
        { label: "Pulley system", value: `${stagesText(input.tensioning.stages)}; sheaves ${efficiencyText(input.tensioning.sheaveEfficiency)}` },
        {
          label: "Mechanical advantage, ideal / while hauling",
          value: `${tensioning.idealAdvantage}:1 / ${factorText(tensioning.haulingAdvantage)}:1`,
        },
        { label: "Haul force to reach the pretension", value: `${loadText(tensioning.haulForce, units)}, ${tensioning.peopleNeeded} on the haul` },
        { label: "Brake", value: `${input.brake.device} on ${ropeDiameterText(input.brake.ropeDiameterMm)} rope, ${brakeOn}` },
        { label: "Brake check", value: brakeWord, alert: brake.verdict !== "holds" },
        { label: "Force at the brake at peak tension", value: loadText(brake.brakeForce, units) },
        { label: "Margin (lowest slip ÷ force at the brake)", value: brake.margin === null ? "no slip results" : `${atLeast}${factorText(brake.margin)}` },
        {
          label: "Highest line tension the brake holds",
          value: brake.highestLineTensionHeld === null ? "unknown: untested" : `${atLeast}${capacityText(brake.highestLineTensionHeld, units)}`,
          alert: brake.highestLineTensionHeld === null,
        },
      ],
    },
  ];

  const components = safetyFactors.map((f): CardComponent => ({
    name: f.name,
    where: where(f),
    factor: f.shown,
    minimum: String(f.minimum),
    result: f.passes ? "Passes" : "Fails",
    mbs: capacityText(f.mbs, units),
    peakLoad: loadText(f.peakLoad, units),
  }));

  const author = revision.authorName ? ` by ${revision.authorName}` : "";
  return {
    rigName: source.rigName,
    about: `${source.siteName ? `Site: ${source.siteName}` : "Free span"} · Revision ${revision.number}${author}, saved ${cardTime(revision.createdAt)}`,
    status: status(source),
    sections,
    components,
    cautions: result.cautions,
    rigUrl: source.rigUrl,
    footer: `Figures of record from engine ${revision.engineVersion}, in ${units === "us" ? "US" : "SI"} units. Loads and sags are rounded up; safety factors, margins, capacities and clearances are cut down, never rounded up.`,
  };
}
