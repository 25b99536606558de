import type { Metadata } from "next";
import { PageHeader } from "@/components/page-header";
import { EmptyState } from "@/components/ui/empty-state";

export const metadata: Metadata = { title: "Kit" };

export default function KitPage() {
  return (
    <>
      <PageHeader title="Kit" lead="The crew's gear catalogue and inventory: webbing, rope, brakes, pulleys, connectors and slings." />
      <EmptyState title="No gear recorded yet">Gear models and the items your crew owns will be listed here.</EmptyState>
    </>
  );
}
