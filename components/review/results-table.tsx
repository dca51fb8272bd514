// Engine proposal against this version, figure by figure; a changed figure says so in words.
import type { Recommendation } from "@/lib/sizing";
import { BALANCE_FIGURES, FRONT_FIGURES, REAR_FIGURES, clickerFigures, formatFigure, type Figure } from "./figures";
import { ScrollBox } from "@/components/ui/scroll-box";

function Section({
  title,
  figures,
  engine,
  current,
}: {
  title: string;
  figures: Figure[];
  engine: Recommendation;
  current: Recommendation;
}) {
  const rows = figures.filter((f) => f.value(engine) !== null || f.value(current) !== null);
  if (rows.length === 0) return null;
  return (
    <tbody>
      <tr>
        <th colSpan={4} scope="colgroup" className="bg-stone-50 px-3 py-2 text-left font-semibold text-stone-800">
          {title}
        </th>
      </tr>
      {rows.map((f) => {
        const a = f.value(engine);
        const b = f.value(current);
        const shownA = formatFigure(a, f.digits);
        const shownB = formatFigure(b, f.digits);
        const changed = shownA !== shownB;
        const delta = a !== null && b !== null ? b - a : null;
        return (
          <tr key={f.key} className={`border-t border-stone-100 ${changed ? "bg-amber-50" : ""}`}>
            <th scope="row" className="px-3 py-1.5 text-left font-normal">
              {f.label}
              {f.unit ? <span className="text-stone-500"> ({f.unit})</span> : null}
            </th>
            <td className="px-3 py-1.5 text-right tabular-nums">{shownA}</td>
            <td className={`px-3 py-1.5 text-right tabular-nums ${changed ? "font-semibold" : ""}`}>{shownB}</td>
            <td className="px-3 py-1.5 text-sm text-amber-900">
              {changed ? `changed${delta !== null ? ` (${delta > 0 ? "+" : ""}${delta.toFixed(f.digits)})` : ""}` : ""}
            </td>
          </tr>
        );
      })}
    </tbody>
  );
}

export function ResultsTable({
  engine,
  current,
  caption,
}: {
  engine: Recommendation;
  current: Recommendation;
  caption: string;
}) {
  return (
    <ScrollBox label={caption} className="rounded-xl border border-stone-200 bg-white">
      <table className="w-full text-sm">
        <caption className="px-3 py-2 text-left font-semibold">{caption}</caption>
        <thead className="bg-stone-100 text-stone-700">
          <tr>
            <th scope="col" className="px-3 py-2 text-left">
              Figure
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Engine proposal
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              This version
            </th>
            <th scope="col" className="px-3 py-2 text-left">
              Against proposal
            </th>
          </tr>
        </thead>
        <Section title="Shock (rear)" figures={REAR_FIGURES} engine={engine} current={current} />
        <Section
          title={`Fork (${current.front.kind === "air" ? "air spring" : "coil springs"})`}
          figures={FRONT_FIGURES}
          engine={engine}
          current={current}
        />
        <Section title="Balance" figures={BALANCE_FIGURES} engine={engine} current={current} />
        <Section
          title="Clickers (from fully closed)"
          figures={clickerFigures(current)}
          engine={engine}
          current={current}
        />
      </table>
    </ScrollBox>
  );
}
