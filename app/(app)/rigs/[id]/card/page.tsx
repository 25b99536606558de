import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import QRCode from "qrcode";
import { authorizePage } from "@/lib/authz";
import { pageOrigin } from "@/lib/app-origin";
import { isUuid } from "@/lib/validations/ids";
import { loadRigCard } from "@/lib/rig-card/load";
import { buttonClasses } from "@/components/ui/button";
import { PrintButton } from "@/components/rig-card/print-button";
import { RigCardView } from "@/components/rig-card/rig-card-view";

export const metadata: Metadata = { title: "Rig card" };

/** The rig card to print: ?revision=<id>, else the rig's signed-off revision, else its latest. */
export default async function RigCardPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ revision?: string }> }) {
  const { id } = await params;
  const { revision: asked } = await searchParams;
  const context = await authorizePage("rig.read", `/rigs/${id}/card${asked ? `?revision=${encodeURIComponent(asked)}` : ""}`);
  if (!isUuid(id) || (asked !== undefined && !isUuid(asked))) notFound();
  const card = await loadRigCard(context.crew, id, asked ?? null, await pageOrigin());
  if (!card) notFound();
  const qr = await QRCode.toDataURL(card.content.rigUrl, { errorCorrectionLevel: "M", margin: 1, scale: 6 });
  return (
    <div className="space-y-4">
      <nav aria-label="Rig card" className="flex flex-wrap items-center gap-3 print:hidden">
        <PrintButton />
        <a href={`/api/rigs/${card.rig.id}/revisions/${card.revision.id}/card`} className={buttonClasses("secondary")}>
          Download PDF
        </a>
        <Link href={`/rigs/${card.rig.id}?revision=${card.revision.id}`}>Back to the rig, revision {card.revision.number}</Link>
      </nav>
      <RigCardView content={card.content} qrDataUrl={qr} />
    </div>
  );
}
