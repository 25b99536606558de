import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/page-header";
import { EmptyState } from "@/components/ui/empty-state";
import { buttonClasses } from "@/components/ui/button";
import { CautionNotice } from "@/components/caution-notice";
import { authorizePage } from "@/lib/authz";

export const metadata: Metadata = { title: "Rigs" };

export default async function RigsPage() {
  // The layout's check does not cover a page: each page that shows crew pages checks access itself.
  await authorizePage("rig.read", "/rigs");
  return (
    <>
      <PageHeader title="Rigs" lead="Plans for a line on a real span: drafted by a rigger, checked and signed off by the crew lead." />
      <div className="space-y-6">
        <EmptyState
          title="No rigs yet"
          action={
            <Link href="/rigs/check" className={buttonClasses("primary")}>
              Check a line
            </Link>
          }
        >
          Plans your crew drafts, reviews and signs off will be listed here. Meanwhile, check a line: enter a span, webbing, anchors and pulleys and see the
          engine&apos;s figures at once.
        </EmptyState>
        <CautionNotice compact />
      </div>
    </>
  );
}
