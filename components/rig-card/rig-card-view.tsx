import type { CardRow, CardSection, RigCardContent } from "@/lib/rig-card/content";
import { classNames } from "@/lib/class-names";

// The rig card as a web page: the same content as the PDF, black on white, laid out for A4 when printed.

const HEADING = "border-b-2 border-black pb-0.5 text-base font-bold text-black print:text-[9.5pt]";

function Rows({ rows }: { rows: CardRow[] }) {
  return (
    <dl className="divide-y divide-ink-300">
      {rows.map((row) => (
        <div key={row.label} className={classNames("flex flex-wrap justify-between gap-x-4 py-1 print:py-px", row.alert && "border-l-4 border-black pl-2")}>
          <dt className={row.alert ? "font-bold" : undefined}>{row.label}</dt>
          <dd className="ml-auto text-right font-bold tabular-nums">{row.value}</dd>
        </div>
      ))}
    </dl>
  );
}

function Section({ section }: { section: CardSection }) {
  return (
    <section className="break-inside-avoid">
      <h2 className={HEADING}>{section.title}</h2>
      {section.note ? <p className="mt-1 text-xs print:text-[7pt]">{section.note}</p> : null}
      <Rows rows={section.rows} />
    </section>
  );
}

const COLUMNS = [
  ["Component", "name"],
  ["Where", "where"],
  ["Factor", "factor"],
  ["Minimum", "minimum"],
  ["Result", "result"],
  ["MBS", "mbs"],
  ["Peak load", "peakLoad"],
] as const;
const RIGHT = new Set(["factor", "minimum", "mbs", "peakLoad"]);

export function RigCardView({ content, qrDataUrl }: { content: RigCardContent; qrDataUrl: string }) {
  const { status } = content;
  return (
    <article aria-label="Rig card" className="space-y-5 bg-white p-4 text-sm text-black sm:p-6 print:space-y-2 print:p-0 print:text-[8pt] print:leading-snug">
      <header className="flex items-start justify-between gap-4">
        <div className="min-w-0">
          <p className="text-xs font-bold uppercase tracking-wide">Spanwright rig card</p>
          <h1 className="break-words text-2xl font-bold text-black print:text-[16pt]">{content.rigName}</h1>
          <p className="mt-1">{content.about}</p>
        </div>
        {/* eslint-disable-next-line @next/next/no-img-element -- a data URL made on the server, nothing for the image optimiser to do */}
        <img
          src={qrDataUrl}
          alt="QR code: opens this revision of the rig"
          width={112}
          height={112}
          className="h-20 w-20 shrink-0 sm:h-28 sm:w-28 print:h-20 print:w-20"
        />
      </header>

      <section
        aria-label="Sign-off"
        className={classNames(
          "p-4 print:p-2.5",
          status.signedOff ? "border-4 border-black" : "bg-black text-white print:[-webkit-print-color-adjust:exact] print:[print-color-adjust:exact]",
        )}
      >
        <p className={classNames("text-3xl font-bold print:text-[20pt]", status.signedOff ? "text-black" : "text-white")}>{status.heading}</p>
        <p className="mt-1">{status.detail}</p>
      </section>
      {status.rows.length > 0 ? <Rows rows={status.rows} /> : null}

      <div className="grid gap-x-8 gap-y-5 sm:grid-cols-2 print:grid-cols-2 print:gap-y-2">
        {content.sections.map((section) => (
          <Section key={section.title} section={section} />
        ))}
      </div>

      <section aria-labelledby="card-components">
        <h2 id="card-components" className={HEADING}>
          Safety factors: every component in the load path (MBS ÷ peak load)
        </h2>
        <table className="hidden w-full text-left sm:table print:table">
          <thead>
            <tr className="border-b border-black">
              {COLUMNS.map(([header, key]) => (
                <th key={key} scope="col" className={classNames("py-1 pr-2 font-bold print:py-px", RIGHT.has(key) && "text-right")}>
                  {header}
                </th>
              ))}
            </tr>
          </thead>
          <tbody className="divide-y divide-ink-300">
            {content.components.map((c, i) => (
              <tr key={`${i}-${c.name}`} className="break-inside-avoid">
                {COLUMNS.map(([, key]) => (
                  <td
                    key={key}
                    className={classNames(
                      "py-1 pr-2 align-top print:py-px",
                      RIGHT.has(key) ? "whitespace-nowrap text-right tabular-nums" : "break-words",
                      (key === "factor" || key === "result") && "font-bold",
                    )}
                  >
                    {key === "result" && c.result === "Fails" ? "FAILS" : c[key]}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {/* On a phone each component reads as a short block instead of a table wider than the screen. */}
        <ul className="divide-y divide-ink-300 sm:hidden print:hidden">
          {content.components.map((c, i) => (
            <li key={`${i}-${c.name}`} className="py-2">
              <p className="break-words font-bold">{c.name}</p>
              <p>{c.where}</p>
              <p className="tabular-nums">
                Factor <strong>{c.factor}</strong> (minimum {c.minimum}): <strong>{c.result === "Fails" ? "FAILS" : c.result}</strong> · MBS {c.mbs} · peak load{" "}
                {c.peakLoad}
              </p>
            </li>
          ))}
        </ul>
        {content.components.length === 0 ? <p>No components in the load path.</p> : null}
      </section>

      <section aria-labelledby="card-cautions" className="break-inside-avoid">
        <h2 id="card-cautions" className={HEADING}>
          Cautions
        </h2>
        <ul className="mt-1 list-disc space-y-0.5 pl-5">
          {content.cautions.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </section>

      <footer className="space-y-1 text-xs print:text-[7pt]">
        <p>{content.footer}</p>
        <p className="break-all">This card online: {content.rigUrl}</p>
      </footer>
    </article>
  );
}
