import type { Knex } from "knex";
import { DEMO_CREW_NAME } from "./01_demo_crew";
import { contentHash } from "../lib/review/content-hash";
import { SIGN_OFF_STATEMENT } from "../lib/review/steps";
import { predictReading } from "../lib/review/reading-prediction";
import { ENGINE_VERSION } from "../physics";

// The demo crew's review and a day on site (all invented): the crew's checklist; the gorge highline's
// revision 2 submitted by the rigger and signed off by the lead, with a checklist run and two load-cell
// readings (revision 3, the lead's own edit, stays a draft); the park line's latest revision in review.

// Items a crew might check before walking; common practice, no source.
const CHECKLIST = [
  "Anchors as planned: slings, shackles and bolts inspected, nothing worn or bent",
  "Mainline and backup inspected end to end: no cuts, burns or core shots",
  "Tree pads or edge protection wherever the line or a sling touches rock or bark",
  "Pretension read on the load cell and within the plan's target",
  "Brake on the rope diameter planned, tail tied off with a backup knot",
  "Leash ring and leash checked; harness and tie-in checked by a partner",
  "Fall zone clear under the line; the public kept out where needed",
  "Weather and wind checked; the crew agrees to go",
];

export async function seed(knex: Knex): Promise<void> {
  const crew = await knex("crews").where({ name: DEMO_CREW_NAME }).first("id");
  if (!crew) return;
  const users = await knex("users").select("id", "name", "email");
  const person = (email: string) => {
    const user = users.find((u: { email: string }) => u.email === email)!;
    return { id: user.id as string, name: user.name as string };
  };
  const rigger = person("sol@greyrock.example");
  const lead = person("idris@greyrock.example");
  const member = person("tove@greyrock.example");
  const revisionOf = (rigName: string, number: number) =>
    knex("rig_revisions")
      .join("rigs", "rigs.id", "rig_revisions.rig_id")
      .where({ "rigs.crew_id": crew.id, "rigs.name": rigName, "rig_revisions.number": number })
      .first("rig_revisions.id", "rig_revisions.rig_id", "rig_revisions.inputs", "rig_revisions.result", "rig_revisions.engine_version");

  await knex.transaction(async (trx) => {
    const items = CHECKLIST.map((text) => ({ id: crypto.randomUUID(), text }));
    await trx("checklist_templates").insert({ crew_id: crew.id, items: JSON.stringify(items), updated_by: lead.id });
    const step = (actor: { id: string; name: string }, rigId: string, revisionId: string | null, action: string, note: string | null = null) =>
      trx("audit_log").insert({ crew_id: crew.id, rig_id: rigId, revision_id: revisionId, actor_id: actor.id, actor_name: actor.name, action, note });

    const gorge = await revisionOf("Corvid Gorge highline", 2);
    if (gorge) {
      await trx("rig_revisions").where({ id: gorge.id }).update({ state: "in_review" });
      await step(rigger, gorge.rig_id, gorge.id, "submitted", "Walker at 82 kg as Tove asked; pretension read at B where the load cell sits.");
      await trx("rig_revisions").where({ id: gorge.id }).update({ state: "signed_off" });
      await trx("sign_offs").insert({
        crew_id: crew.id,
        rig_id: gorge.rig_id,
        revision_id: gorge.id,
        signed_by_id: lead.id,
        signed_by_name: lead.name,
        statement: SIGN_OFF_STATEMENT,
        content_hash: contentHash({ inputs: gorge.inputs, result: gorge.result, engineVersion: gorge.engine_version }),
        engine_version: gorge.engine_version,
      });
      await step(lead, gorge.rig_id, gorge.id, "signed_off");

      const [run] = await trx("checklist_runs")
        .insert({
          crew_id: crew.id,
          rig_id: gorge.rig_id,
          revision_id: gorge.id,
          items: JSON.stringify(items),
          started_by_id: member.id,
          started_by_name: member.name,
        })
        .returning("id");
      await step(member, gorge.rig_id, gorge.id, "checklist_started");
      for (const item of items.slice(0, 3)) {
        await trx("checklist_ticks").insert({
          crew_id: crew.id,
          run_id: run.id,
          item_id: item.id,
          checked: true,
          ticked_by_id: member.id,
          ticked_by_name: member.name,
        });
        await step(member, gorge.rig_id, gorge.id, "checklist_ticked", `Ticked: ${item.text}`);
      }

      const readAt = gorge.inputs.pretension.readAt as "a" | "b";
      const readings = [
        { kind: "pretension" as const, anchor: readAt, measuredN: 3350, sagM: 0.24, note: "Read at B after the last pull." },
        { kind: "walker" as const, anchor: readAt, measuredN: 4400, walkerMassKg: 82, walkerPositionM: 42, note: "Tove at mid-span." },
      ];
      for (const reading of readings) {
        const prediction = predictReading(gorge.inputs, reading, "si");
        if (prediction.kind !== "predicted") throw new Error(`The demo reading cannot be predicted: ${prediction.message}`);
        await trx("tension_readings").insert({
          crew_id: crew.id,
          rig_id: gorge.rig_id,
          revision_id: gorge.id,
          kind: reading.kind,
          anchor: reading.anchor,
          measured_n: reading.measuredN,
          sag_m: reading.kind === "pretension" ? reading.sagM : null,
          walker_mass_kg: reading.kind === "walker" ? reading.walkerMassKg : null,
          walker_position_m: reading.kind === "walker" ? reading.walkerPositionM : null,
          predicted_n: prediction.tensionN,
          engine_version: ENGINE_VERSION,
          mainline_name: gorge.inputs.mainline.name,
          note: reading.note,
          recorded_by_id: member.id,
          recorded_by_name: member.name,
        });
        await step(member, gorge.rig_id, gorge.id, "reading_recorded");
      }
    }

    const park = await revisionOf("Alderbank practice line", 2);
    if (park) {
      await trx("rig_revisions").where({ id: park.id }).update({ state: "in_review" });
      await step(rigger, park.rig_id, park.id, "submitted", "Raised the pretension to 2 kN for the beginners' session.");
    }
  });
}
