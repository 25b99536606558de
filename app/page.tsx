import Link from "next/link";
import { buttonClasses } from "@/components/ui/button";
import { CautionNotice } from "@/components/caution-notice";

const jobs = [
  { title: "Plan", text: "Measure the span, choose webbing, backup, anchors, pulley system and brake, and set the pretension." },
  { title: "Check", text: "See line tension, sag, anchor and bridle-leg loads, the leash-fall peak, haul effort, brake margin and every safety factor." },
  { title: "Sign off", text: "The crew lead reviews the plan and signs it off, or sends it back with a comment." },
  { title: "Rig", text: "On site, the crew reuses signed-off rigs, works the checklist and records what the load cell showed." },
];

export default function HomePage() {
  return (
    <main id="main" className="mx-auto max-w-page px-gutter py-10">
      <header className="max-w-3xl">
        <p className="text-sm font-semibold uppercase tracking-wide text-spruce-700">Spanwright</p>
        <h1 className="mt-2 text-3xl">Rig plans your whole crew can check before anyone walks</h1>
        <p className="mt-4 text-lg text-ink-700">
          Spanwright works out what a slackline, longline or highline will do to its anchors, its brake and its walker, and keeps the crew&apos;s plans, gear
          and slip tests in one place.
        </p>
        <div className="mt-6 flex flex-wrap gap-3">
          <Link href="/sign-in" className={buttonClasses("primary")}>
            Sign in
          </Link>
          <Link href="/rigs" className={buttonClasses("secondary")}>
            Open rigs
          </Link>
        </div>
      </header>
      <section aria-labelledby="jobs" className="mt-10">
        <h2 id="jobs">From span to sign-off</h2>
        <ol className="mt-4 grid gap-4 sm:grid-cols-2">
          {jobs.map((job, index) => (
            <li key={job.title} className="rounded-panel bg-white p-5 shadow-panel">
              <h3 className="font-semibold">
                {index + 1}. {job.title}
              </h3>
              <p className="mt-1 text-ink-700">{job.text}</p>
            </li>
          ))}
        </ol>
      </section>
      <div className="mt-10">
        <CautionNotice />
      </div>
    </main>
  );
}
