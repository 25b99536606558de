import type { Metadata } from "next";
import { PageHeader } from "@/components/page-header";
import { EmptyState } from "@/components/ui/empty-state";

export const metadata: Metadata = { title: "Crew" };

export default function CrewPage() {
  return (
    <>
      <PageHeader title="Crew" lead="People, roles, invitations and the crew's settings." />
      <EmptyState title="Sign in to see your crew">Members, invitations and settings will be shown here.</EmptyState>
    </>
  );
}
