import type { Recommendation } from "@/lib/sizing";

/** Says when the shown version's loads came from the model's calibration, and from how many reports. */
export function CalibrationNote({ output }: { output: Recommendation }) {
  const reports = output.resolved?.calibration?.reports;
  if (!reports) return null;
  return (
    <p className="rounded-lg bg-pine-50 px-3 py-2 text-sm text-pine-900">
      <span className="font-semibold">Calibrated loads:</span> this version used the bike model&apos;s calibration from{" "}
      {reports} sag report{reports === 1 ? "" : "s"} of the shop&apos;s riders, not the catalog&apos;s weight split.
    </p>
  );
}
