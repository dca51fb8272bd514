// A version as it was saved (read-only): earlier versions and approved ones stay readable.
import { ForceChart } from "@/components/charts/force-chart";
import { forkForceChart, rearForceChart } from "@/lib/charts/recommendation-charts";
import { recommend, type Recommendation, type SizingInput } from "@/lib/sizing";
import { ResultsTable } from "./results-table";
import { ReasonsList, SafetyNote, WarningsList } from "./warnings-list";

export function VersionView(props: {
  version: number;
  state: string;
  input: SizingInput;
  output: Recommendation;
  notesForRider: string | null;
  internalNotes: string | null;
}) {
  const engine = recommend(props.input);
  const r = props.output;
  return (
    <section aria-labelledby="version-heading" className="flex flex-col gap-4">
      <h2 id="version-heading" className="text-xl font-semibold">
        Version {props.version} ({props.state}, read-only)
      </h2>
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
        <ResultsTable engine={engine} current={r} caption={`Version ${props.version} against the engine's proposal`} />
        <div className="flex flex-col gap-4">
          <WarningsList warnings={r.warnings} />
          {props.notesForRider ? (
            <p className="text-sm">
              <span className="font-semibold">Notes for the rider:</span> {props.notesForRider}
            </p>
          ) : null}
          {props.internalNotes ? (
            <p className="text-sm">
              <span className="font-semibold">Internal notes:</span> {props.internalNotes}
            </p>
          ) : null}
          <SafetyNote />
          <details className="rounded-lg border border-stone-200 bg-white p-3">
            <summary className="cursor-pointer font-medium">Engine reasons</summary>
            <ReasonsList reasons={r.reasons} />
          </details>
        </div>
      </div>
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
        <ForceChart title="Shock: wheel force against rear wheel travel" spec={rearForceChart(r)} />
        <ForceChart title="Fork: force against fork travel" spec={forkForceChart(r)} />
      </div>
    </section>
  );
}
