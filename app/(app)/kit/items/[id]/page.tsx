import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/page-header";
import { buttonClasses } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { Table } from "@/components/ui/table";
import { ItemForm } from "@/components/kit/item-form";
import { InspectionForm } from "@/components/kit/inspection-form";
import { RetireForm } from "@/components/kit/retire-form";
import { FileUploadForm } from "@/components/kit/file-upload-form";
import { FileList } from "@/components/kit/file-list";
import { StatusBadge } from "@/components/kit/status-badge";
import { authorizePage, crewRowOrNotFound } from "@/lib/authz";
import { can } from "@/lib/roles";
import { GEAR_KIND_LABELS, INSPECTION_RESULT_LABELS } from "@/lib/validations/kit";
import { findItem, listInspections } from "@/db/kit";
import { listUploads } from "@/db/uploads";
import { asSentence } from "@/lib/sentence";

export const metadata: Metadata = { title: "Item" };

export default async function GearItemPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { crew, role } = await authorizePage("kit.read", `/kit/items/${id}`);
  const item = await crewRowOrNotFound(findItem, crew.id, id);
  const [inspections, photos] = await Promise.all([listInspections(crew.id, id), listUploads(crew.id, { itemId: id })]);
  const writer = can(role, "kit.write");
  return (
    <>
      <PageHeader
        title={item.label}
        lead={
          <>
            <Link href={`/kit/models/${item.modelId}`}>{item.modelName}</Link> · {GEAR_KIND_LABELS[item.kind]} · in service since {item.inServiceSince} ·{" "}
            <StatusBadge retiredOn={item.retiredOn} />
          </>
        }
        actions={
          writer && !item.retiredOn ? (
            <Dialog title={`Retire ${item.label}`} trigger={<button className={buttonClasses("danger")}>Retire item</button>}>
              <RetireForm url={`/api/kit/items/${id}/retire`} what="Item" />
            </Dialog>
          ) : null
        }
      />
      <div className="space-y-8">
        {item.retiredOn ? (
          <p className="rounded-panel bg-ink-100 p-4">
            Retired on {item.retiredOn}: {asSentence(item.retiredReason ?? "")} It cannot be put in a new plan, nor inspected again; its log stays.
          </p>
        ) : null}
        {item.notes ? <p className="max-w-prose whitespace-pre-line">{item.notes}</p> : null}
        <section aria-labelledby="inspections-heading" className="space-y-3">
          <h2 id="inspections-heading">Inspection log</h2>
          {inspections.length ? (
            <Table
              caption="Inspections, newest first"
              rows={inspections}
              rowKey={(r) => r.id}
              columns={[
                { key: "on", header: "Date", cell: (r) => r.inspectedOn },
                { key: "who", header: "Who", cell: (r) => r.inspectorName },
                { key: "result", header: "Result", cell: (r) => INSPECTION_RESULT_LABELS[r.result] },
                { key: "notes", header: "Notes", wrap: true, cell: (r) => r.notes },
              ]}
            />
          ) : (
            <p className="text-ink-600">Never inspected. Inspect all gear before use.</p>
          )}
          {writer && !item.retiredOn ? <InspectionForm itemId={id} /> : null}
        </section>
        <section aria-labelledby="photos-heading" className="space-y-3">
          <h2 id="photos-heading">Photos</h2>
          <FileList files={photos} removable={writer} />
          {writer ? <FileUploadForm purpose="photo" owner={{ itemId: id }} /> : null}
        </section>
        {writer ? (
          <section aria-labelledby="edit-heading" className="space-y-3">
            <h2 id="edit-heading">Edit item</h2>
            <ItemForm modelId={item.modelId} item={item} />
          </section>
        ) : null}
      </div>
    </>
  );
}
