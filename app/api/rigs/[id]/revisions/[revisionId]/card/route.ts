import { crewRoute } from "@/lib/api";
import { appOrigin } from "@/lib/app-origin";
import { RequestError } from "@/lib/http-errors";
import { rowId } from "@/lib/validations/ids";
import { loadRigCard } from "@/lib/rig-card/load";
import { rigCardPdf } from "@/lib/rig-card/pdf";

/** A file name from the rig's name: letters, digits, dots and dashes only, so every browser and file system takes it. */
function fileName(rigName: string, revisionNumber: number): string {
  const safe = rigName
    .normalize("NFKD")
    // Accents come apart from their letters under NFKD and go: "Fjällbrücke" becomes "Fjallbrucke".
    .replace(/[\u0300-\u036f]/g, "")
    .replace(/[^A-Za-z0-9.-]+/g, "-")
    .slice(0, 80)
    .replace(/^[-.]+|[-.]+$/g, "");
  return `rig-card-${safe || "rig"}-revision-${revisionNumber}.pdf`;
}

export const GET = crewRoute<{ id: string; revisionId: string }>("rig.read", async ({ crew }, request, { id, revisionId }) => {
  const card = await loadRigCard(crew, rowId(id, "rig"), rowId(revisionId, "revision"), appOrigin(request));
  if (!card) throw new RequestError(404, "No such revision of this rig in this crew.");
  const pdf = await rigCardPdf(card.content);
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="${fileName(card.rig.name, card.revision.number)}"`,
      "cache-control": "private, no-store",
    },
  });
});
