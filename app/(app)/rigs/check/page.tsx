import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/page-header";
import { CautionNotice } from "@/components/caution-notice";
import { Planner } from "@/components/rigs/planner";
import { authorizePage } from "@/lib/authz";
import { plannerData } from "@/lib/planner/page-data";
import { startingRig } from "@/lib/rig-form/starting-rig";

export const metadata: Metadata = { title: "Check a line" };

export default async function LineCheckPage() {
  const context = await authorizePage("rig.read", "/rigs/check");
  const data = await plannerData(context.crew.id);
  return (
    <>
      <PageHeader
        title="Check a line"
        lead={
          <>
            Try a rig without saving it: its tensions, sag, leash-fall loads, haul, brake and safety factors as you type, in{" "}
            {data.units === "us" ? "US units (lbf, ft, lb)" : "SI units (kN, m, kg)"} as {context.crew.name} has set. It starts from an invented worked example;
            pick gear from the Kit to check it against the crew&apos;s own figures and slip bench. To keep a plan, <Link href="/rigs/new">start a rig</Link>.
          </>
        }
      />
      <div className="space-y-6">
        <CautionNotice />
        <Planner
          mode="check"
          units={data.units}
          catalogue={data.catalogue}
          sites={data.sites}
          start={{ ...startingRig(data.minimums, data.minClearanceM), siteId: null }}
        />
      </div>
    </>
  );
}
