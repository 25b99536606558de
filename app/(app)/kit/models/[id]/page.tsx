import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/page-header";
import { buttonClasses } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { EmptyState } from "@/components/ui/empty-state";
import { Caution } from "@/components/caution-notice";
import { ItemTable } from "@/components/kit/item-table";
import { ItemForm } from "@/components/kit/item-form";
import { RetireForm } from "@/components/kit/retire-form";
import { FileUploadForm } from "@/components/kit/file-upload-form";
import { FileList } from "@/components/kit/file-list";
import { SpecTable } from "@/components/kit/spec-table";
import { StatusBadge } from "@/components/kit/status-badge";
import { authorizePage, crewRowOrNotFound } from "@/lib/authz";
import { can } from "@/lib/roles";
import { GEAR_KIND_LABELS } from "@/lib/validations/kit";
import { findModel, listItems } from "@/db/kit";
import { listUploads } from "@/db/uploads";
import { asSentence } from "@/lib/sentence";

export const metadata: Metadata = { title: "Gear model" };

export default async function GearModelPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { crew, role } = await authorizePage("kit.read", `/kit/models/${id}`);
  const model = await crewRowOrNotFound(findModel, crew.id, id);
  const [items, files] = await Promise.all([listItems(crew.id, id), listUploads(crew.id, { modelId: id })]);
  const writer = can(role, "kit.write");
  return (
    <>
      <PageHeader
        title={model.name}
        lead={
          <>
            {GEAR_KIND_LABELS[model.kind]} · <StatusBadge retiredOn={model.retiredOn} />
          </>
        }
        actions={
          writer ? (
            <>
              <Link href={`/kit/models/${id}/edit`} className={buttonClasses("secondary")}>
                Edit specs
              </Link>
              {model.retiredOn ? null : (
                <Dialog title={`Retire ${model.name}`} trigger={<button className={buttonClasses("danger")}>Retire model</button>}>
                  <RetireForm url={`/api/kit/models/${id}/retire`} what="Model" />
                </Dialog>
              )}
            </>
          ) : null
        }
      />
      <div className="space-y-8">
        {model.retiredOn ? (
          <p className="rounded-panel bg-ink-100 p-4">
            Retired on {model.retiredOn}: {asSentence(model.retiredReason ?? "")} No new items or plans may use it.
          </p>
        ) : null}
        <section aria-labelledby="specs-heading" className="space-y-3">
          <h2 id="specs-heading">Specs</h2>
          <SpecTable kind={model.kind} specs={model.specs} units={crew.units} />
          {model.notes ? <p className="max-w-prose whitespace-pre-line">{model.notes}</p> : null}
        </section>
        <section aria-labelledby="items-heading" className="space-y-3">
          <h2 id="items-heading">Items</h2>
          {items.length ? <ItemTable items={items} showModel={false} /> : <EmptyState title="No items of this model yet" />}
          {writer && !model.retiredOn ? (
            <details className="rounded-panel border border-ink-200 bg-white p-4">
              <summary className="cursor-pointer font-semibold">Add an item</summary>
              <div className="mt-4">
                <ItemForm modelId={id} />
              </div>
            </details>
          ) : null}
        </section>
        <section aria-labelledby="files-heading" className="space-y-3">
          <h2 id="files-heading">Photos and manuals</h2>
          <FileList files={files} removable={writer} />
          {writer ? (
            <div className="grid gap-6 md:grid-cols-2">
              <FileUploadForm purpose="photo" owner={{ modelId: id }} />
              <FileUploadForm purpose="manual" owner={{ modelId: id }} />
            </div>
          ) : null}
        </section>
        <Caution>
          An MBS is the rated strength of new gear. Wear, UV, knots, edges and shock loads take strength away that no record shows: inspect every item before
          use and retire it when in doubt.
        </Caution>
      </div>
    </>
  );
}
