// Each sag report: what was fitted, what the rider measured, and what the engine predicts for it with
// the catalog's loads and with the fitted ones.
import Link from "next/link";
import type { ReportComparison } from "@/lib/calibration/service";
import { ScrollBox } from "@/components/ui/scroll-box";

const day = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeZone: "UTC" });
const mm = (v: number | undefined | null) => (v === undefined || v === null ? "–" : `${Math.round(v)}`);
const mm1 = (v: number | undefined | null) => (v === undefined || v === null ? "–" : v.toFixed(1));

function Cells({ measured, catalog, fitted }: { measured?: number; catalog?: number; fitted?: number }) {
  return (
    <>
      <td className="px-2 py-2 font-semibold">{mm(measured)}</td>
      <td className="px-2 py-2 text-stone-600">{mm1(catalog)}</td>
      <td className="px-2 py-2">{mm1(fitted)}</td>
    </>
  );
}

export function ReportsTable({ rows }: { rows: ReportComparison[] }) {
  return (
    <ScrollBox label="Sag reports" className="rounded-xl border border-stone-200 bg-white">
      <table className="w-full text-left text-sm">
        <caption className="px-3 py-2 text-left text-stone-700">
          Sag in mm: measured by the rider, predicted with the catalog&apos;s loads, predicted with the fitted loads.
        </caption>
        <thead className="bg-stone-100 text-stone-700">
          <tr>
            <th scope="col" rowSpan={2} className="px-2 py-2">
              Reported
            </th>
            <th scope="col" rowSpan={2} className="px-2 py-2">
              Rider with gear
            </th>
            <th scope="col" rowSpan={2} className="px-2 py-2">
              Shock spring, preload
            </th>
            <th scope="colgroup" colSpan={3} className="px-2 py-1">
              Rear static
            </th>
            <th scope="colgroup" colSpan={3} className="px-2 py-1">
              Rear race
            </th>
            <th scope="col" rowSpan={2} className="px-2 py-2">
              Fork spring, preload
            </th>
            <th scope="colgroup" colSpan={3} className="px-2 py-1">
              Front static
            </th>
            <th scope="colgroup" colSpan={3} className="px-2 py-1">
              Front race
            </th>
          </tr>
          <tr>
            {Array.from({ length: 4 }, (_, i) => (
              <SubHeads key={i} />
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.id} className="border-t border-stone-100">
              <td className="px-2 py-2">
                {day.format(new Date(r.createdAt))}
                <br />
                <Link href={`/shop/requests/${r.requestId}?version=${r.version}`} className="text-pine-700 underline">
                  request {r.requestNumber}, v{r.version}
                </Link>
              </td>
              <td className="px-2 py-2">{r.riderMassKg.toFixed(1)} kg</td>
              <td className="px-2 py-2">
                {r.rear ? `${r.rear.rateNmm.toFixed(1)} N/mm, ${r.rear.preloadMm.toFixed(1)} mm` : "not measured"}
              </td>
              <Cells
                measured={r.rear?.staticMm}
                catalog={r.catalog?.rear?.staticMm}
                fitted={r.fitted?.rear?.staticMm}
              />
              <Cells measured={r.rear?.raceMm} catalog={r.catalog?.rear?.raceMm} fitted={r.fitted?.rear?.raceMm} />
              <td className="px-2 py-2">
                {r.front
                  ? r.front.airPressureKpaGauge !== null && r.front.rateNmm === null
                    ? `${r.front.airPressureKpaGauge.toFixed(0)} kPa`
                    : `${r.front.rateNmm?.toFixed(2) ?? "–"} N/mm, ${r.front.preloadMm?.toFixed(1) ?? "–"} mm`
                  : "not measured"}
              </td>
              <Cells
                measured={r.front?.staticMm}
                catalog={r.catalog?.front?.staticMm}
                fitted={r.fitted?.front?.staticMm}
              />
              <Cells measured={r.front?.raceMm} catalog={r.catalog?.front?.raceMm} fitted={r.fitted?.front?.raceMm} />
            </tr>
          ))}
          {rows.length === 0 ? (
            <tr>
              <td colSpan={16} className="px-3 py-6 text-center text-stone-600">
                No sag reports on this model yet.
              </td>
            </tr>
          ) : null}
        </tbody>
      </table>
    </ScrollBox>
  );
}

function SubHeads() {
  return (
    <>
      <th scope="col" className="px-2 py-1 font-medium">
        measured
      </th>
      <th scope="col" className="px-2 py-1 font-medium">
        catalog
      </th>
      <th scope="col" className="px-2 py-1 font-medium">
        fitted
      </th>
    </>
  );
}
