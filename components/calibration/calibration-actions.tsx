"use client";

// Apply the fitted loads to the model, or undo the active calibration; each asks to confirm first.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { callApi } from "@/lib/api-client";

type Action = "apply" | "undo";

const CONFIRM: Record<Action, { question: string; yes: string }> = {
  apply: {
    question:
      "New recommendations for this model will use the fitted loads. Recommendations already made keep theirs. Apply?",
    yes: "Yes, apply the fitted loads",
  },
  undo: {
    question:
      "New recommendations for this model will go back to the catalog's weight split. Recommendations already made keep theirs. Undo?",
    yes: "Yes, undo the calibration",
  },
};

export function CalibrationActions({ id, canApply, canUndo }: { id: string; canApply: boolean; canUndo: boolean }) {
  const router = useRouter();
  const [asking, setAsking] = useState<Action | null>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);

  const run = async (action: Action) => {
    setBusy(true);
    setError(null);
    const result = await callApi(`/api/shop/catalog/${id}/calibration`, "POST", { action });
    setBusy(false);
    setAsking(null);
    if (!result.ok) return setError(result.error);
    setDone(
      action === "apply"
        ? "Calibration applied: new recommendations for this model use the fitted loads."
        : "Calibration undone: new recommendations use the catalog's values again.",
    );
    router.refresh();
  };

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap gap-2">
        <Button disabled={!canApply || busy} onClick={() => setAsking("apply")}>
          Apply to this model
        </Button>
        <Button variant="secondary" disabled={!canUndo || busy} onClick={() => setAsking("undo")}>
          Undo calibration
        </Button>
      </div>
      {asking ? (
        <div
          role="alertdialog"
          aria-labelledby="calibration-confirm"
          className="flex flex-col gap-2 rounded-lg border border-amber-400 bg-amber-soft p-3"
        >
          <p id="calibration-confirm" className="text-sm">
            {CONFIRM[asking].question}
          </p>
          <div className="flex flex-wrap gap-2">
            <Button variant={asking === "undo" ? "danger" : "primary"} disabled={busy} onClick={() => run(asking)}>
              {CONFIRM[asking].yes}
            </Button>
            <Button variant="secondary" disabled={busy} onClick={() => setAsking(null)}>
              Cancel
            </Button>
          </div>
        </div>
      ) : null}
      {error ? (
        <p role="alert" className="text-sm text-red-800">
          {error}
        </p>
      ) : null}
      {done ? (
        <p role="status" className="text-sm text-pine-900">
          {done}
        </p>
      ) : null}
    </div>
  );
}
