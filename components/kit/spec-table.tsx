import { stretchTensionDigits } from "@/lib/figures";
import { unitLabel, type UnitSystem } from "@/lib/rig-form/quantities";
import { measureLabel, type GearKind, type GearSpecs, type MeasureKey, type StretchPointInput } from "@/lib/validations/kit";
import { constructionText, specEntries, specText } from "./spec-summary";

/** A model's specs as a definition list in the crew's units, stretch points as a small table. */
export function SpecTable({ kind, specs, units }: { kind: GearKind; specs: GearSpecs; units: UnitSystem }) {
  const entries = specEntries(kind, specs);
  if (entries.length === 0) return <p className="text-ink-600">No specs recorded.</p>;
  return (
    <dl className="grid max-w-2xl grid-cols-[auto_1fr] gap-x-6 gap-y-2 rounded-panel border border-ink-200 bg-white p-4">
      {entries.map(([key, value]) => {
        if (key === "stretchPoints") {
          return [
            <dt key={`${key}-t`} className="font-semibold">
              Stretch points
            </dt>,
            <dd key={`${key}-d`}>
              <table className="text-sm">
                <thead>
                  <tr>
                    <th scope="col" className="pr-4 text-left">
                      Tension ({unitLabel("stretchTension", units)})
                    </th>
                    <th scope="col" className="text-left">
                      Elongation (%)
                    </th>
                  </tr>
                </thead>
                <tbody>
                  {(value as StretchPointInput[]).map((p) => (
                    <tr key={p.tensionKN}>
                      <td className="pr-4 tabular-nums">{stretchTensionDigits(p.tensionKN, units)}</td>
                      <td className="tabular-nums">{p.elongationPct}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </dd>,
          ];
        }
        if (key === "construction") {
          return [
            <dt key={`${key}-t`} className="font-semibold">
              Construction
            </dt>,
            <dd key={`${key}-d`}>{constructionText(value)}</dd>,
          ];
        }
        return [
          <dt key={`${key}-t`} className="font-semibold">
            {measureLabel(key as MeasureKey, units)}
          </dt>,
          <dd key={`${key}-d`} className="tabular-nums">
            {specText(key as MeasureKey, value as number, units)}
          </dd>,
        ];
      })}
    </dl>
  );
}
