import type { Metadata } from "next";
import { PageHeader } from "@/components/page-header";
import { EmptyState } from "@/components/ui/empty-state";

export const metadata: Metadata = { title: "Slip bench" };

export default function SlipBenchPage() {
  return (
    <>
      <PageHeader title="Slip bench" lead="Slip tests of brakes and line grips on each rope diameter, with their load-cell traces." />
      <EmptyState title="No slip tests yet">Results your gear testers record will build the crew&apos;s slip table here.</EmptyState>
    </>
  );
}
