import Link from "next/link";

export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <main id="main" className="mx-auto flex min-h-screen max-w-md flex-col justify-center px-gutter py-10">
      <Link href="/" className="mb-6 text-xl font-bold text-spruce-800 no-underline">
        Spanwright
      </Link>
      <div className="rounded-panel bg-white p-6 shadow-panel">{children}</div>
    </main>
  );
}
