import { MEASURES, withUnit, type GearSpecs, type MeasureKey } from "@/lib/validations/kit";

/** A model's specs as a definition list, stretch points as a small table. */
export function SpecTable({ specs }: { specs: GearSpecs }) {
  const entries = Object.entries(specs);
  if (entries.length === 0) return <p className="text-ink-600">No specs recorded.</p>;
  return (
    <dl className="grid max-w-2xl grid-cols-[auto_1fr] gap-x-6 gap-y-2 rounded-panel border border-ink-200 bg-white p-4">
      {entries.map(([key, value]) => {
        if (key === "stretchPoints") {
          const points = value as { tensionKN: number; elongationPct: number }[];
          return [
            <dt key={`${key}-t`} className="font-semibold">
              Stretch points
            </dt>,
            <dd key={`${key}-d`}>
              <table className="text-sm">
                <thead>
                  <tr>
                    <th scope="col" className="pr-4 text-left">
                      Tension (kN)
                    </th>
                    <th scope="col" className="text-left">
                      Elongation (%)
                    </th>
                  </tr>
                </thead>
                <tbody>
                  {points.map((p) => (
                    <tr key={p.tensionKN}>
                      <td className="pr-4 tabular-nums">{p.tensionKN}</td>
                      <td className="tabular-nums">{p.elongationPct}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </dd>,
          ];
        }
        const measure = MEASURES[key as MeasureKey];
        return [
          <dt key={`${key}-t`} className="font-semibold">
            {measure?.label ?? "Construction"}
          </dt>,
          <dd key={`${key}-d`} className="tabular-nums">
            {measure ? withUnit(key as MeasureKey, String(value)) : String(value)}
          </dd>,
        ];
      })}
    </dl>
  );
}
