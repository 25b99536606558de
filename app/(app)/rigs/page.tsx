import type { Metadata } from "next";
import { PageHeader } from "@/components/page-header";
import { EmptyState } from "@/components/ui/empty-state";
import { CautionNotice } from "@/components/caution-notice";

export const metadata: Metadata = { title: "Rigs" };

export default function RigsPage() {
  return (
    <>
      <PageHeader title="Rigs" lead="Plans for a line on a real span: drafted by a rigger, checked and signed off by the crew lead." />
      <div className="space-y-6">
        <EmptyState title="No rigs yet">Plans your crew drafts, reviews and signs off will be listed here.</EmptyState>
        <CautionNotice compact />
      </div>
    </>
  );
}
