import type { Metadata } from "next";
import { PageHeader } from "@/components/page-header";
import { CautionNotice } from "@/components/caution-notice";
import { LineCheck } from "@/components/rigs/line-check";
import { authorizePage } from "@/lib/authz";
import { crewSettings } from "@/db/crews";
import { benchResults } from "@/db/slip-tests";
import { startingRig } from "@/lib/rig-form/starting-rig";

export const metadata: Metadata = { title: "Check a line" };

export default async function LineCheckPage() {
  const context = await authorizePage("rig.read", "/rigs/check");
  const [settings, crewBench] = await Promise.all([crewSettings(context.crew.id), benchResults(context.crew.id)]);
  const units = settings.units === "us" ? "us" : "si";
  return (
    <>
      <PageHeader
        title="Check a line"
        lead={`Enter a rig and see its tensions, sag, leash-fall loads, haul, brake and safety factors as you type, in ${units === "us" ? "US units (lbf, ft, lb)" : "SI units (kN, m, kg)"} as ${context.crew.name} has set. It starts from an invented worked example; brakes are checked against ${context.crew.name}'s own slip bench${crewBench.length ? "" : ", which has no results yet"}.`}
      />
      <div className="space-y-6">
        <CautionNotice />
        <LineCheck startingRig={startingRig(settings.minSafetyFactors)} units={units} crewBench={crewBench} />
      </div>
    </>
  );
}
