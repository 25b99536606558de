import type { Metadata } from "next";
import Link from "next/link";
import { ConfirmEmailForm } from "@/components/account/confirm-email-form";

export const metadata: Metadata = { title: "Confirm your new e-mail" };

export default async function ConfirmEmailPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  return (
    <>
      <h1 className="mb-4 text-xl">Confirm your new e-mail</h1>
      {token ? (
        <ConfirmEmailForm token={token} />
      ) : (
        <p role="alert">
          This page needs the link from the e-mail. <Link href="/account">Change the e-mail on your account page</Link>.
        </p>
      )}
    </>
  );
}
