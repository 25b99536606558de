import type { GearKind } from "@/lib/validations/kit";
import type { SiteGround, MeasurementMethod } from "@/lib/validations/sites";
import { engineGround } from "@/lib/validations/sites";
import type { SlipResult } from "@/physics";
import { labelOf } from "./fields";
import { ENGINE_CATEGORY_OF_KIND } from "@/lib/gear-categories";

// The planner's gear comes from the crew's Kit: a picked model fills the engine's figures (mass, MBS,
// stretch points, efficiency, rope diameter), and the brake is checked against the slip tests recorded
// for that very model. The same preparation runs in the browser (for figures as you type) and on the
// server (for the revision of record), so both evaluate exactly the same input.

export interface KitModel {
  id: string;
  kind: GearKind;
  name: string;
  specs: Record<string, unknown>;
  retiredOn: string | null;
}

export interface KitBenchTest {
  id: string;
  deviceId: string;
  ropeDiameterMm: number;
  result: "slipped" | "held";
  forceN: number;
}

export interface KitCatalogue {
  models: readonly KitModel[];
  bench: readonly KitBenchTest[];
}

export interface SiteSnapshot {
  id: string;
  name: string;
  spanM: number;
  heightDifferenceM: number;
  uncertaintyM: number;
  measuredBy: MeasurementMethod;
  ground: SiteGround;
}

/** A Kit model as a revision used it: the model's id and its figures at the time of saving. */
export interface SnapshotGear {
  field: string;
  modelId: string;
  kind: GearKind;
  name: string;
  specs: Record<string, unknown>;
}

export interface RevisionSnapshot {
  site: SiteSnapshot | null;
  gear: SnapshotGear[];
  /** Gear typed into the plan rather than picked from the Kit, by the field that names it. */
  typed: { field: string; name: string }[];
  slipTestIds: string[];
}

export interface GearProblem {
  field: string;
  message: string;
}

type Input = Record<string, unknown> & {
  spanM?: unknown;
  mainline?: Record<string, unknown>;
  backup?: Record<string, unknown>;
  brake?: Record<string, unknown>;
  tensioning?: Record<string, unknown>;
  anchors?: Record<string, { components?: Record<string, unknown>[] } | undefined>;
  slipBench?: Record<string, unknown>[];
};

/** The kinds of gear each pick may be, by the field holding the model id. */
export const PICK_KINDS = {
  mainline: ["webbing", "rope"],
  backup: ["webbing", "rope"],
  component: ["sling", "connector", "webbing", "pulley", "line_grip", "other"],
  brake: ["brake", "line_grip"],
  brakeRope: ["rope"],
  pulley: ["pulley"],
} as const satisfies Record<string, readonly GearKind[]>;

const kN = (value: unknown) => Number(value) * 1000;
const kgPerMetre = (grams: unknown) => Number(grams) / 1000;

function lineFigures(model: KitModel) {
  return {
    name: model.name,
    massPerMetreKg: kgPerMetre(model.specs.massPerMetreG),
    mbsN: kN(model.specs.mbsKN),
    stretchPoints: structuredClone(model.specs.stretchPoints),
  };
}

/** Slip results recorded on the Kit's bench carry the test's id, so they are told apart from typed ones. */
export const isBenchResult = (result: Record<string, unknown> | null) => typeof result?.testId === "string";

/** A list as given, or no items for anything else (a value of the wrong type is the engine's to refuse). */
function listOrNone<T>(value: T[] | undefined): T[] {
  return Array.isArray(value) ? value : [];
}

/**
 * The engine's input for the planner's values: picked Kit models fill their figures, the site fills the
 * span, height difference and ground, and the picked brake brings the crew's slip tests of that model.
 * Picks the Kit cannot honour (unknown, retired, of the wrong kind, a rope the brake does not take) are
 * listed as problems, each on the field that names it; the input is still prepared so figures show.
 */
export function prepareRigInput(values: unknown, catalogue: KitCatalogue, site: SiteSnapshot | null) {
  const input = structuredClone((values ?? {}) as Input);
  delete input.siteId;
  const problems: GearProblem[] = [];
  const gear: SnapshotGear[] = [];
  const typed: { field: string; name: string }[] = [];
  const byId = new Map(catalogue.models.map((m) => [m.id, m]));

  function pick(field: string, owner: Record<string, unknown> | undefined, key: string, kinds: readonly GearKind[]): KitModel | null {
    const id = owner?.[key];
    if (typeof id !== "string" || id === "") {
      if (owner && typeof owner.name === "string") typed.push({ field, name: owner.name });
      return null;
    }
    const model = byId.get(id);
    if (!model) {
      problems.push({ field, message: `${labelOf(field)}: this gear is not in the crew's Kit; pick another or type its figures.` });
      return null;
    }
    if (!kinds.includes(model.kind)) {
      problems.push({ field, message: `${labelOf(field)}: ${model.name} is not ${kinds.join(" or ")} gear.` });
      return null;
    }
    if (model.retiredOn) problems.push({ field, message: `${labelOf(field)}: ${model.name} was retired on ${model.retiredOn}; pick gear in service.` });
    gear.push({ field, modelId: model.id, kind: model.kind, name: model.name, specs: structuredClone(model.specs) });
    return model;
  }

  if (site) {
    input.spanM = site.spanM;
    input.heightDifferenceM = site.heightDifferenceM;
    const ground = engineGround(site.ground);
    if (ground) input.ground = ground;
    else delete input.ground;
  }

  const mainline = pick("mainline.modelId", input.mainline, "modelId", PICK_KINDS.mainline);
  if (mainline && input.mainline) Object.assign(input.mainline, lineFigures(mainline));
  const backup = pick("backup.modelId", input.backup, "modelId", PICK_KINDS.backup);
  if (backup && input.backup) Object.assign(input.backup, lineFigures(backup));

  for (const side of ["a", "b"] as const) {
    // Components that are not a list are left as sent, for the engine to refuse on their field.
    listOrNone(input.anchors?.[side]?.components).forEach((component, i) => {
      const model = pick(`anchors.${side}.components.${i}.modelId`, component, "modelId", PICK_KINDS.component);
      if (!model) return;
      if (model.specs.mbsKN === undefined) {
        problems.push({
          field: `anchors.${side}.components.${i}.modelId`,
          message: `${labelOf(`anchors.${side}.components.${i}.modelId`)}: ${model.name} has no MBS in the Kit.`,
        });
        return;
      }
      Object.assign(component, { name: model.name, category: ENGINE_CATEGORY_OF_KIND[model.kind], mbsN: kN(model.specs.mbsKN) });
    });
  }

  const pulley = pick("tensioning.pulleyModelId", input.tensioning && { ...input.tensioning, name: undefined }, "pulleyModelId", PICK_KINDS.pulley);
  if (pulley && input.tensioning) input.tensioning.sheaveEfficiency = Number(pulley.specs.efficiency);

  const rope = pick("brake.ropeModelId", input.brake && { ...input.brake, name: undefined }, "ropeModelId", PICK_KINDS.brakeRope);
  if (rope && input.brake) input.brake.ropeDiameterMm = Number(rope.specs.diameterMm);
  const device = pick("brake.modelId", input.brake && { ...input.brake, name: input.brake.device }, "modelId", PICK_KINDS.brake);
  const benchResults = device ? catalogue.bench.filter((t) => t.deviceId === device.id) : [];
  if (device && input.brake) {
    input.brake.device = device.name;
    const diameter = Number(input.brake.ropeDiameterMm);
    const [min, max] = [Number(device.specs.minRopeMm), Number(device.specs.maxRopeMm)];
    if (Number.isFinite(diameter) && (diameter < min || diameter > max)) {
      const field = rope ? "brake.ropeModelId" : "brake.ropeDiameterMm";
      problems.push({ field, message: `${labelOf(field)}: ${diameter} mm rope is outside what ${device.name} takes according to the Kit (${min}–${max} mm).` });
    }
  }
  // Slip results that are not a list are left as sent, for the engine to refuse on their field.
  const typedResults = input.slipBench ?? [];
  if (Array.isArray(typedResults)) {
    input.slipBench = [
      ...benchResults.map((t): Record<string, unknown> & SlipResult => ({
        testId: t.id,
        device: device!.name,
        ropeDiameterMm: t.ropeDiameterMm,
        result: t.result,
        forceN: t.forceN,
      })),
      ...typedResults.filter((r) => !isBenchResult(r)),
    ];
  }

  const snapshot: RevisionSnapshot = { site, gear, typed, slipTestIds: benchResults.map((t) => t.id) };
  return { input, snapshot, problems };
}

export type PreparedRig = ReturnType<typeof prepareRigInput>;

/**
 * The planner's editable values from a saved revision: its inputs with the site it stood on; the Kit's
 * slip results and the site's ground are left out, as the next preparation brings them again.
 */
export function plannerValues(revision: { inputs: Record<string, unknown>; snapshot: RevisionSnapshot }): Record<string, unknown> {
  const values = structuredClone(revision.inputs) as Input;
  values.slipBench = listOrNone(values.slipBench).filter((r) => !isBenchResult(r));
  if (revision.snapshot.site) delete values.ground;
  return { ...values, siteId: revision.snapshot.site?.id ?? null };
}

/** The Kit models a revision used whose figures have changed since it was saved (or that are gone), by field. */
export interface KitChange {
  field: string;
  name: string;
  change: "changed" | "gone" | "retired";
}

export function kitChangesSince(snapshot: RevisionSnapshot, catalogue: KitCatalogue): KitChange[] {
  const byId = new Map(catalogue.models.map((m) => [m.id, m]));
  return snapshot.gear.flatMap((g): KitChange[] => {
    const now = byId.get(g.modelId);
    if (!now) return [{ field: g.field, name: g.name, change: "gone" }];
    if (now.retiredOn) return [{ field: g.field, name: g.name, change: "retired" }];
    return JSON.stringify(now.specs) === JSON.stringify(g.specs) ? [] : [{ field: g.field, name: g.name, change: "changed" }];
  });
}

/**
 * The Kit and site exactly as a revision recorded them: preparing the revision's values against this
 * gives back the very input it saved, whatever has changed in the Kit since (for reading a revision).
 */
export function recordedCatalogue(revision: { inputs: Record<string, unknown>; snapshot: RevisionSnapshot }): KitCatalogue {
  const brake = revision.snapshot.gear.find((g) => g.field === "brake.modelId");
  const bench = listOrNone(revision.inputs.slipBench as Record<string, unknown>[] | undefined)
    .filter(isBenchResult)
    .map((r) => ({
      id: String(r.testId),
      deviceId: brake?.modelId ?? "",
      ropeDiameterMm: Number(r.ropeDiameterMm),
      result: r.result as KitBenchTest["result"],
      forceN: Number(r.forceN),
    }));
  const models = revision.snapshot.gear.map((g) => ({ id: g.modelId, kind: g.kind, name: g.name, specs: g.specs, retiredOn: null }));
  return { models: [...new Map(models.map((m) => [m.id, m])).values()], bench };
}
