// The fitted loads beside the catalog's (and the active calibration's, when one is applied).
import type { CalibrationParameters } from "@/lib/sizing";
import { ScrollBox } from "@/components/ui/scroll-box";

const ROWS: { key: keyof CalibrationParameters; label: string; format: (v: number) => string }[] = [
  { key: "rearSprungKg", label: "Sprung mass on the rear, bike alone", format: (v) => `${v.toFixed(1)} kg` },
  { key: "frontSprungKg", label: "Sprung mass on the fork, bike alone", format: (v) => `${v.toFixed(1)} kg` },
  {
    key: "riderRearShare",
    label: "Rider's share on the rear (sag stance)",
    format: (v) => `${(v * 100).toFixed(1)} %`,
  },
];

interface Props {
  catalog: CalibrationParameters;
  fitted: CalibrationParameters | null;
  reports: number;
  active: { parameters: CalibrationParameters; reports: number } | null;
}

export function ParametersTable({ catalog, fitted, reports, active }: Props) {
  return (
    <ScrollBox label="Loads" className="rounded-xl border border-stone-200 bg-white">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Loads: catalog, fitted and applied</caption>
        <thead className="bg-stone-100 text-stone-700">
          <tr>
            <th scope="col" className="px-3 py-2">
              Load
            </th>
            <th scope="col" className="px-3 py-2">
              Catalog
            </th>
            <th scope="col" className="px-3 py-2">
              Fitted from {reports} report{reports === 1 ? "" : "s"}
            </th>
            {active ? (
              <th scope="col" className="px-3 py-2">
                Applied now ({active.reports} reports)
              </th>
            ) : null}
          </tr>
        </thead>
        <tbody>
          {ROWS.map((row) => (
            <tr key={row.key} className="border-t border-stone-100">
              <th scope="row" className="px-3 py-2 font-medium">
                {row.label}
              </th>
              <td className="px-3 py-2">{row.format(catalog[row.key])}</td>
              <td className="px-3 py-2">{fitted ? row.format(fitted[row.key]) : "no fit"}</td>
              {active ? <td className="px-3 py-2">{row.format(active.parameters[row.key])}</td> : null}
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollBox>
  );
}
