import type { Metadata } from "next";
import { PageHeader } from "@/components/page-header";
import { EmptyState } from "@/components/ui/empty-state";

export const metadata: Metadata = { title: "Sites" };

export default function SitesPage() {
  return (
    <>
      <PageHeader title="Sites" lead="The spans your crew rigs, with the signed-off rigs for each." />
      <EmptyState title="No sites yet">Places your crew rigs will be listed here.</EmptyState>
    </>
  );
}
