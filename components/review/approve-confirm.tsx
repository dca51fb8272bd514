"use client";

// The last look before approving: what the rider will get by e-mail (to whom, the subject, the
// figures on the sheet and the tuner's notes), with "Approve and e-mail" and "Back to editing".
import { Button } from "@/components/ui/button";
import { formatNumber } from "@/lib/format";
import type { Recommendation } from "@/lib/sizing";

export interface ApproveRider {
  name: string;
  email: string;
  requestNumber: number;
}

export function ApproveConfirm({
  rider,
  version,
  revised,
  rec,
  notesForRider,
  busy,
  onConfirm,
  onCancel,
}: {
  rider: ApproveRider;
  version: number;
  revised: boolean;
  rec: Recommendation;
  notesForRider: string;
  busy: boolean;
  onConfirm: () => void;
  onCancel: () => void;
}) {
  // The subject of emails/sheet-ready.tsx, written out here so the browser does not load the e-mail code.
  const subject = revised
    ? `Revised setup sheet (version ${version}) for request ${rider.requestNumber}`
    : `Your setup sheet for request ${rider.requestNumber} is ready`;
  const f = rec.front;
  const rows: [string, string][] = [
    [
      "Shock spring",
      `${formatNumber(rec.rear.chosenRate.nMm, 1)} N/mm, preload ${formatNumber(rec.rear.preloadMm, 1)} mm`,
    ],
    [
      "Fork",
      f.kind === "air"
        ? `air, ${formatNumber(f.airPressure?.kpaGauge ?? 0, 0)} kPa`
        : `${formatNumber(f.chosenRate?.nMm ?? 0, 2)} N/mm per spring, preload ${formatNumber(f.preloadMm ?? 0, 1)} mm, oil level ${formatNumber(f.oilLevelMm ?? 0, 0)} mm`,
    ],
    [
      "Race sag targets",
      `shock ${formatNumber(rec.rear.sagTargets.raceSagMm, 0)} mm, fork ${formatNumber(f.sagTargets.raceSagMm, 0)} mm`,
    ],
  ];
  return (
    <div
      role="alertdialog"
      aria-labelledby="approve-confirm-heading"
      aria-describedby="approve-confirm-what"
      className="flex flex-col gap-3 rounded-xl border-2 border-pine-700 bg-white p-4"
    >
      <h3 id="approve-confirm-heading" className="text-lg font-semibold">
        Approve version {version} and e-mail the rider?
      </h3>
      <p id="approve-confirm-what" className="text-sm">
        Version {version} is frozen and this e-mail goes to{" "}
        <span className="font-semibold break-all">
          {rider.name} &lt;{rider.email}&gt;
        </span>{" "}
        at once:
      </p>
      <dl className="grid grid-cols-1 gap-1 text-sm sm:grid-cols-[10rem_1fr]">
        <dt className="text-stone-600">Subject</dt>
        <dd>{subject}</dd>
        <dt className="text-stone-600">With</dt>
        <dd>a link to the PDF setup sheet (and the link for reporting measured sag)</dd>
        {rows.map(([k, v]) => (
          <div key={k} className="contents">
            <dt className="text-stone-600">{k}</dt>
            <dd>{v}</dd>
          </div>
        ))}
        <dt className="text-stone-600">Notes for the rider</dt>
        <dd className="whitespace-pre-line">{notesForRider.trim() || "none"}</dd>
      </dl>
      <div className="flex flex-wrap gap-3">
        <Button onClick={onConfirm} disabled={busy}>
          Approve and e-mail {rider.name}
        </Button>
        <Button variant="secondary" onClick={onCancel} disabled={busy}>
          Back to editing
        </Button>
      </div>
    </div>
  );
}
