import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/page-header";
import { EmptyState } from "@/components/ui/empty-state";
import { SlipTestForm } from "@/components/slip-bench/slip-test-form";
import { RoleRequired } from "@/components/role-required";
import { authorizeRolePage } from "@/lib/authz";
import { SLIP_DEVICE_KINDS, type GearSpecs } from "@/lib/validations/kit";
import { listModels } from "@/db/kit";

export const metadata: Metadata = { title: "Record a slip test" };

export default async function NewSlipTestPage() {
  const { context, refusal } = await authorizeRolePage("slip.write", "/slip-bench/new");
  if (refusal) return <RoleRequired title="Record a slip test" refusal={refusal} back={{ href: "/slip-bench", label: "Back to the slip bench" }} />;
  const { crew } = context;
  const [devices, ropes] = await Promise.all([listModels(crew.id, SLIP_DEVICE_KINDS), listModels(crew.id, ["rope"])]);
  return (
    <>
      <PageHeader
        title="Record a slip test"
        lead="Pull the rope through the device slowly on a load cell; record where it slipped, or the load it held to when you stopped."
      />
      {devices.length === 0 ? (
        <EmptyState title="No brakes or line grips in the Kit" action={<Link href="/kit/new">Add one to the Kit</Link>}>
          A slip test is of a device in your crew&apos;s Kit.
        </EmptyState>
      ) : (
        <SlipTestForm
          devices={devices.map((d) => ({ id: d.id, name: d.name }))}
          ropes={ropes.map((r) => ({ id: r.id, name: r.name, diameterMm: (r.specs as GearSpecs<"rope">).diameterMm }))}
          units={crew.units}
        />
      )}
    </>
  );
}
