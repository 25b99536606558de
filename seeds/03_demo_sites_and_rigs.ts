import type { Knex } from "knex";
import { DEMO_CREW_NAME } from "./01_demo_crew";
import { MODELS } from "./02_demo_kit_and_slip_bench";
import { startingRig } from "../lib/rig-form/starting-rig";
import { buildRevision, revisionRow } from "../lib/planner/revision-row";
import type { KitCatalogue, SiteSnapshot } from "../lib/planner/kit";
import type { Site } from "../lib/validations/sites";

// Invented sites for the demo crew (a park, a gorge for a highline, a field for a longline) and rigs on
// them with two or three revisions each, built from the demo Kit and evaluated by the engine as the
// planner would. Every place, span and height here is made up for the demo.

const SITES: (Site & { key: string })[] = [
  {
    key: "park",
    name: "Alderbank Park, the two limes",
    accessNotes: "Public park; the council asks for tree pads and no lines across the footpath. Park at the north gate.",
    spanM: 26,
    heightDifferenceM: 0.2,
    measuredBy: "tape",
    uncertaintyM: 0.1,
    ground: { kind: "level", heightAboveGroundM: 1.1 },
    anchors: { a: { kind: "tree", trunkDiameterCm: 70, notes: "Healthy lime, no dead wood above." }, b: { kind: "tree", trunkDiameterCm: 64, notes: "" } },
    coordinates: null,
  },
  {
    key: "gorge",
    name: "Corvid Gorge, east notch",
    accessNotes: "Forty minutes' walk from the upper car park. The west rim is loose after rain: rope up before leaning out.",
    spanM: 84,
    heightDifferenceM: 1.5,
    measuredBy: "laser",
    uncertaintyM: 0.5,
    ground: {
      kind: "profile",
      points: [
        { xM: 0, heightM: -3 },
        { xM: 8, heightM: -28 },
        { xM: 35, heightM: -52 },
        { xM: 62, heightM: -44 },
        { xM: 78, heightM: -20 },
        { xM: 84, heightM: -2 },
      ],
    },
    anchors: {
      a: { kind: "bolts", boltCount: 2, boltSizeMm: 12, notes: "Two stainless glue-ins a metre apart, placed 2024." },
      b: { kind: "bolts", boltCount: 3, boltSizeMm: 12, notes: "Three bolts on the slab; the lowest is older, back it up." },
    },
    coordinates: null,
  },
  {
    key: "field",
    name: "Millrace Meadow longline field",
    accessNotes: "Private field; ask the farm before rigging. Cattle graze from May.",
    spanM: 150,
    heightDifferenceM: -0.8,
    measuredBy: "laser",
    uncertaintyM: 1,
    ground: { kind: "level", heightAboveGroundM: 1.6 },
    anchors: { a: { kind: "tree", trunkDiameterCm: 90, notes: "Old oak at the hedge." }, b: { kind: "structure", notes: "Concrete fence post pair, braced." } },
    coordinates: null,
  },
];

type Change = Record<string, unknown>;

interface DemoRig {
  site: string;
  name: string;
  /** Each revision: what changes from the one before, and who saves it. */
  revisions: { by: string; change: Change }[];
}

export async function seed(knex: Knex): Promise<void> {
  const crew = await knex("crews").where({ name: DEMO_CREW_NAME }).first("id", "min_safety_factors", "min_clearance_m");
  if (!crew) return;
  const people = Object.fromEntries((await knex("users").select("id", "email")).map((u: { id: string; email: string }) => [u.email, u.id]));
  const models = await knex("gear_models").where({ crew_id: crew.id }).select("id", "kind", "name", "specs", knex.raw('retired_on::text as "retiredOn"'));
  const modelId = (key: (typeof MODELS)[number]["key"]) => models.find((m) => m.name === MODELS.find((d) => d.key === key)!.name)!.id as string;
  const tests = await knex("slip_tests")
    .where({ crew_id: crew.id })
    .select(
      "id",
      knex.raw('device_model_id as "deviceId"'),
      knex.raw('rope_diameter_mm::float8 as "ropeDiameterMm"'),
      "result",
      knex.raw('force_n as "forceN"'),
    );
  const catalogue: KitCatalogue = { models, bench: tests };
  const example = startingRig(crew.min_safety_factors, crew.min_clearance_m);

  const kitGear = {
    mainline: { modelId: modelId("tubular") },
    backup: { modelId: modelId("tubular"), ridesAlong: true },
    brake: { modelId: modelId("toothed-cam"), ropeModelId: modelId("static-10.5") },
    tensioning: { ...example.tensioning, pulleyModelId: modelId("pulley") },
    slipBench: [],
  };
  const anchor = (layout: Change) => ({
    layout,
    components: [
      { modelId: modelId("sling"), carries: "leg" },
      { modelId: modelId("shackle"), carries: "line" },
    ],
  });
  const RIGS: DemoRig[] = [
    {
      site: "park",
      name: "Alderbank practice line",
      revisions: [
        {
          by: "sol@greyrock.example",
          change: { pretension: { forceN: 1500, readAt: "a" }, backup: undefined, anchors: { a: anchor({ kind: "single" }), b: anchor({ kind: "single" }) } },
        },
        { by: "sol@greyrock.example", change: { pretension: { forceN: 2000, readAt: "a" } } },
      ],
    },
    {
      site: "gorge",
      name: "Corvid Gorge highline",
      revisions: [
        {
          by: "sol@greyrock.example",
          change: {
            pretension: { forceN: 3000, readAt: "b" },
            anchors: { a: anchor({ kind: "bridle", includedAngleDeg: 60 }), b: anchor({ kind: "bridle", includedAngleDeg: 45 }) },
          },
        },
        { by: "sol@greyrock.example", change: { pretension: { forceN: 3400, readAt: "b" }, walker: { massKg: 82, positionFraction: 0.5 } } },
        { by: "idris@greyrock.example", change: { leashFall: { leashLengthM: 1.0, harnessHeightM: 1.0 } } },
      ],
    },
    {
      site: "field",
      name: "Millrace longline",
      revisions: [
        {
          by: "sol@greyrock.example",
          change: {
            pretension: { forceN: 3500, readAt: "a" },
            leashFall: { leashLengthM: 1.2, harnessHeightM: 1.0 },
            anchors: { a: anchor({ kind: "single" }), b: anchor({ kind: "single" }) },
          },
        },
        { by: "sol@greyrock.example", change: { tensioning: { ...kitGear.tensioning, stages: [{ ratio: 5 }, { ratio: 3 }] } } },
      ],
    },
  ];

  await knex.transaction(async (trx) => {
    const siteSnapshots: Record<string, SiteSnapshot> = {};
    for (const { key, ...site } of SITES) {
      const [{ id }] = await trx("sites")
        .insert({
          crew_id: crew.id,
          created_by: people["sol@greyrock.example"],
          name: site.name,
          access_notes: site.accessNotes,
          span_m: site.spanM,
          height_difference_m: site.heightDifferenceM,
          measured_by: site.measuredBy,
          uncertainty_m: site.uncertaintyM,
          ground: site.ground.kind === "none" ? null : JSON.stringify(site.ground),
          anchors: JSON.stringify(site.anchors),
        })
        .returning("id");
      const { name, spanM, heightDifferenceM, uncertaintyM, measuredBy, ground } = site;
      siteSnapshots[key] = { id, name, spanM, heightDifferenceM, uncertaintyM, measuredBy, ground };
    }
    for (const rig of RIGS) {
      const site = siteSnapshots[rig.site];
      const [{ id: rigId }] = await trx("rigs")
        .insert({ crew_id: crew.id, site_id: site.id, name: rig.name, created_by: people[rig.revisions[0].by] })
        .returning("id");
      let inputs: Change = { ...example, ...kitGear, name: rig.name };
      let basedOn: string | null = null;
      for (const [i, step] of rig.revisions.entries()) {
        inputs = { ...inputs, ...step.change };
        const revision = buildRevision({ name: rig.name, siteId: site.id, inputs }, catalogue, site, "si");
        const [{ id }]: { id: string }[] = await trx("rig_revisions")
          .insert({ ...revisionRow(crew.id, rigId, people[step.by], revision), number: i + 1, based_on_id: basedOn })
          .returning("id");
        basedOn = id;
      }
    }
  });
}
