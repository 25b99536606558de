import { AppShell } from "@/components/app-shell";
import { QueryProvider } from "@/components/query-provider";
import { AccountMenu } from "@/components/account-menu";
import { CrewSwitcher } from "@/components/crew/crew-switcher";
import { getCurrentSession } from "@/lib/auth/session";
import { currentMembership } from "@/lib/authz";

// Pages check access themselves; the shell only shows who is signed in and in which crew.
export default async function AppLayout({ children }: { children: React.ReactNode }) {
  const signedIn = await getCurrentSession();
  if (!signedIn) return <AppShell>{children}</AppShell>;
  const current = await currentMembership(signedIn.user);
  return (
    <AppShell
      crewSwitcher={current ? <CrewSwitcher crews={signedIn.user.memberships.map((m) => m.crew)} currentId={current.crew.id} /> : null}
      accountMenu={<AccountMenu name={signedIn.user.name} role={current?.role ?? null} />}
    >
      <QueryProvider>{children}</QueryProvider>
    </AppShell>
  );
}
