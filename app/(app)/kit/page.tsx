import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/page-header";
import { buttonClasses } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { Caution } from "@/components/caution-notice";
import { ModelTable } from "@/components/kit/model-table";
import { ItemTable } from "@/components/kit/item-table";
import { authorizePage } from "@/lib/authz";
import { can } from "@/lib/roles";
import { listItems, listModels } from "@/db/kit";

export const metadata: Metadata = { title: "Kit" };

export default async function KitPage() {
  const { crew, role } = await authorizePage("kit.read", "/kit");
  const [models, items] = await Promise.all([listModels(crew.id), listItems(crew.id)]);
  const addModel = can(role, "kit.write") ? (
    <Link href="/kit/new" className={buttonClasses()}>
      Add a gear model
    </Link>
  ) : null;
  return (
    <>
      <PageHeader
        title="Kit"
        lead="The crew's gear catalogue and inventory: webbing, rope, brakes, line grips, pulleys, connectors and slings."
        actions={addModel}
      />
      <div className="space-y-8">
        <section aria-labelledby="models-heading" className="space-y-3">
          <h2 id="models-heading">Gear models</h2>
          {models.length ? (
            <ModelTable models={models} units={crew.units} />
          ) : (
            <EmptyState title="No gear recorded yet" action={addModel}>
              Record each model your crew uses with its specs, then add the items you own.
            </EmptyState>
          )}
        </section>
        <section aria-labelledby="items-heading" className="space-y-3">
          <h2 id="items-heading">Inventory</h2>
          {items.length ? (
            <ItemTable items={items} />
          ) : (
            <EmptyState title="No items yet">Add items from a gear model&apos;s page: one for each piece you own.</EmptyState>
          )}
        </section>
        <Caution>
          The Kit records what the crew owns and what its makers rate it for; it does not say that an item is fit for use. Inspect every item before use.
        </Caution>
      </div>
    </>
  );
}
