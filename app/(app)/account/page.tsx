import type { Metadata } from "next";
import { PageHeader } from "@/components/page-header";
import { PasswordForm, ProfileForm } from "@/components/account/account-forms";
import { SessionsList } from "@/components/account/sessions-list";
import { requireSignedIn } from "@/lib/auth/require-signed-in";
import { sessionHandle } from "@/lib/tokens";
import { sessionsOf } from "@/db/users";
import { deviceName } from "@/lib/device-name";

export const metadata: Metadata = { title: "Account" };

export default async function AccountPage() {
  const { user, session } = await requireSignedIn("/account");
  const sessions = await sessionsOf(user.id);
  const current = sessionHandle(session.id);
  return (
    <>
      <PageHeader title="Your account" />
      <div className="space-y-10">
        <section aria-labelledby="profile" className="space-y-3">
          <h2 id="profile">Profile</h2>
          <ProfileForm name={user.name} email={user.email} />
        </section>
        <section aria-labelledby="password" className="space-y-3">
          <h2 id="password">Password</h2>
          <PasswordForm />
        </section>
        <section aria-labelledby="devices" className="space-y-3">
          <h2 id="devices">Devices</h2>
          <SessionsList
            sessions={sessions.map((s) => ({
              handle: s.handle,
              createdAt: s.createdAt.toISOString(),
              device: deviceName(s.userAgent),
              current: s.handle === current,
            }))}
          />
        </section>
      </div>
    </>
  );
}
