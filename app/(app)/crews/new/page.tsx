import type { Metadata } from "next";
import { PageHeader } from "@/components/page-header";
import { CreateCrewForm } from "@/components/crew/create-crew-form";
import { requireSignedIn } from "@/lib/auth/require-signed-in";

export const metadata: Metadata = { title: "New crew" };

export default async function NewCrewPage() {
  await requireSignedIn("/crews/new");
  return (
    <>
      <PageHeader
        title="Create a crew"
        lead="A crew holds its rigs, kit, slip tests and sites. You will be its owner and can invite the others by e-mail. If someone has invited you, open the link in their e-mail instead."
      />
      <CreateCrewForm />
    </>
  );
}
