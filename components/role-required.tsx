import Link from "next/link";
import { PageHeader } from "@/components/page-header";
import { PERMISSIONS, refusalText, withArticle, type RoleRefusal } from "@/lib/roles";

/** What a page says instead of its content when the person's role is below the one it needs. */
export function RoleRequired({ title, refusal, back }: { title: string; refusal: RoleRefusal; back: { href: string; label: string } }) {
  return (
    <>
      <PageHeader title={title} />
      <section role="alert" aria-labelledby="role-required" className="max-w-prose space-y-3 rounded-panel border-2 border-ink-300 bg-white p-6">
        <h2 id="role-required">This page needs {withArticle(PERMISSIONS[refusal.action])}</h2>
        <p>{refusalText(refusal.action, refusal.role, refusal.crewName)}</p>
        <p className="text-ink-600">An owner of {refusal.crewName} can change your role on the Crew page if you need to.</p>
        <Link href={back.href}>{back.label}</Link>
      </section>
    </>
  );
}
