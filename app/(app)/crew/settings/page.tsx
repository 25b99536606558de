import type { Metadata } from "next";
import { PageHeader } from "@/components/page-header";
import { CrewSettingsForm } from "@/components/crew/settings-form";
import { authorizePage } from "@/lib/authz";
import { can } from "@/lib/roles";
import { crewSettings } from "@/db/crews";
import type { CrewSettings } from "@/lib/validations/crew";

export const metadata: Metadata = { title: "Crew settings" };

export default async function CrewSettingsPage() {
  const context = await authorizePage("crew.read", "/crew/settings");
  const settings = (await crewSettings(context.crew.id)) as CrewSettings;
  return (
    <>
      <PageHeader title="Crew settings" lead={`Units and minimum safety factors for every plan of ${context.crew.name}.`} />
      <CrewSettingsForm settings={settings} editable={can(context.role, "crew.settings")} />
    </>
  );
}
