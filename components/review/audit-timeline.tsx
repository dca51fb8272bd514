// The request's audit trail as a timeline: who did what, when, with old and new values.
import type { RequestStatus } from "@/db/schema";
import {
  AUDIT_ACTION_LABELS,
  EMAIL_TEMPLATE_LABELS,
  STAFF_NOTICE_LABELS,
  humanize,
  labelOf,
  overrideFieldLabel,
} from "@/lib/labels";
import { STATUS_LABELS } from "@/lib/requests/status";
import { formatDateTime } from "@/lib/format";

export interface AuditItem {
  id: number;
  actorLabel: string;
  action: string;
  detail: unknown;
  createdAt: Date;
}

const value = (v: unknown) =>
  v === null || v === undefined
    ? "engine's choice"
    : typeof v === "number"
      ? String(Math.round(v * 1000) / 1000)
      : String(v);
const status = (s: unknown) => STATUS_LABELS[s as RequestStatus] ?? String(s);

function Detail({ action, detail }: { action: string; detail: Record<string, unknown> }) {
  if (action === "request.status_changed")
    return (
      <>
        {status(detail.from)} → {status(detail.to)}
      </>
    );
  if (action === "request.assigned") return <>to {String(detail.toName ?? "nobody")}</>;
  if (action === "request.question_asked") return <>“{String(detail.question)}”</>;
  if (action === "request.declined") return <>reason: “{String(detail.reason)}”</>;
  if (action === "recommendation.approved") return <>version {String(detail.version)}</>;
  if (action === "sag.reported") return <>against version {String(detail.version)} (see Sag reports)</>;
  if (action === "request.rider_answered") return <>(see Questions and answers)</>;
  if (action === "request.notices_seen")
    return <>{((detail.kinds as string[] | undefined) ?? []).map((k) => labelOf(STAFF_NOTICE_LABELS, k)).join(", ")}</>;
  if (action.startsWith("email."))
    return (
      <>
        {labelOf(EMAIL_TEMPLATE_LABELS, detail.template)} to {String(detail.to)}
        {detail.error ? ` (${String(detail.error)})` : ""}
      </>
    );
  if (action === "recommendation.saved") {
    const changes = (detail.changes as { field: string; from: unknown; to: unknown }[] | undefined) ?? [];
    return (
      <>
        version {String(detail.version)}
        {detail.newVersion ? " (new version)" : ""}
        {changes.length ? (
          <ul className="mt-1 list-disc pl-5">
            {changes.map((c) => (
              <li key={c.field}>
                {overrideFieldLabel(c.field)}: {value(c.from)} → {value(c.to)}
              </li>
            ))}
          </ul>
        ) : null}
        {detail.notesForRider ? <div>notes for the rider changed</div> : null}
        {detail.internalNotesChanged ? <div>internal notes changed</div> : null}
      </>
    );
  }
  return null;
}

export function AuditTimeline({ events }: { events: AuditItem[] }) {
  return (
    <section aria-labelledby="audit-heading" className="rounded-xl border border-stone-200 bg-white p-4">
      <h2 id="audit-heading" className="mb-2 text-lg font-semibold">
        History
      </h2>
      <ol className="flex flex-col gap-2 border-l-2 border-pine-100 pl-4 text-sm">
        {events.map((e) => (
          <li key={e.id} className={e.action === "email.failed" ? "rounded bg-red-50 p-1 text-red-900" : ""}>
            <time dateTime={e.createdAt.toISOString()} className="text-stone-600">
              {formatDateTime(e.createdAt)}
            </time>{" "}
            <span className="font-medium">{e.actorLabel}</span> {AUDIT_ACTION_LABELS[e.action] ?? humanize(e.action)}{" "}
            <Detail action={e.action} detail={(e.detail ?? {}) as Record<string, unknown>} />
          </li>
        ))}
      </ol>
    </section>
  );
}
