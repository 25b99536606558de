import { INVITATION_REFUSALS } from "@/lib/invitation-state";

export default function UnknownInvitation() {
  return (
    <>
      <h1 className="mb-2 text-xl">This invitation cannot be used</h1>
      <p role="alert">{INVITATION_REFUSALS.unknown.message}</p>
    </>
  );
}
