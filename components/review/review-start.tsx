"use client";

// "Start review" and "Take" on a request, and its unseen notices with "Mark as seen". Opening the
// page changes nothing; these buttons do (each audited on the server).
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import type { RequestStatus, StaffNoticeKind } from "@/db/schema";
import { callApi, errorWithFields } from "@/lib/api-client";
import { STAFF_NOTICE_LABELS } from "@/lib/labels";

const OPEN: RequestStatus[] = ["submitted", "in_review", "waiting_for_rider"];

export function ReviewStart({
  requestId,
  status,
  assignedToMe,
  unseen,
}: {
  requestId: string;
  status: RequestStatus;
  assignedToMe: boolean;
  unseen: StaffNoticeKind[];
}) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function post(path: "start" | "seen", body: unknown) {
    setBusy(true);
    setError(null);
    const r = await callApi(`/api/requests/${requestId}/${path}`, "POST", body, {
      offline: "No connection to the server. Nothing was changed; try again.",
    });
    setBusy(false);
    if (!r.ok) return setError(errorWithFields(r));
    router.refresh();
  }
  const canTake = OPEN.includes(status) && !assignedToMe;
  if (status !== "submitted" && !canTake && !unseen.length) return null;
  return (
    <div className="flex flex-col gap-2 rounded-lg bg-sky-50 px-3 py-2 text-sm text-sky-950">
      {unseen.length ? (
        <p>
          <span className="font-semibold">New here:</span> {unseen.map((k) => STAFF_NOTICE_LABELS[k]).join(", ")}.
        </p>
      ) : null}
      {status === "submitted" ? <p>Nobody has started this request. Opening it changes nothing.</p> : null}
      <div className="flex flex-wrap gap-2">
        {status === "submitted" ? (
          <Button onClick={() => post("start", {})} disabled={busy}>
            Start review
          </Button>
        ) : null}
        {canTake ? (
          <Button variant="secondary" onClick={() => post("start", { take: true })} disabled={busy}>
            {status === "submitted" ? "Take and start review" : "Take this request"}
          </Button>
        ) : null}
        {unseen.length ? (
          <Button variant="ghost" onClick={() => post("seen", {})} disabled={busy}>
            Mark as seen
          </Button>
        ) : null}
      </div>
      {error ? (
        <p role="alert" className="text-red-800">
          {error}
        </p>
      ) : null}
    </div>
  );
}
