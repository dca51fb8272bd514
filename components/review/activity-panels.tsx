// Messages with the rider, e-mails sent about the request (failed ones stand out), photos and the
// rider's sag reports with the engine's verdicts.
import { EmailStatusItems } from "@/components/mail/email-status-list";
import type { RequestDetail } from "@/db/queries/review";
import { formatDateTime } from "@/lib/format";

const box = "rounded-xl border border-stone-200 bg-white p-4";

export function MessagesPanel({ messages }: { messages: RequestDetail["messages"] }) {
  return (
    <section aria-labelledby="messages-heading" className={box}>
      <h2 id="messages-heading" className="mb-2 text-lg font-semibold">
        Questions and answers
      </h2>
      {messages.length === 0 ? <p className="text-sm text-stone-600">No messages yet.</p> : null}
      <ol className="flex flex-col gap-2 text-sm">
        {messages.map((m) => (
          <li key={m.id} className={`rounded-lg p-2 ${m.author === "tuner" ? "bg-pine-50" : "bg-amber-50"}`}>
            <p className="text-stone-600">
              {m.author === "tuner" ? `Question from ${m.authorName ?? "the shop"}` : "Rider's answer"} ·{" "}
              {formatDateTime(m.createdAt)}
            </p>
            <p className="whitespace-pre-line">{m.body}</p>
          </li>
        ))}
      </ol>
    </section>
  );
}

export function EmailsPanel({ emails }: { emails: RequestDetail["emails"] }) {
  return (
    <section aria-labelledby="emails-heading" className={box}>
      <h2 id="emails-heading" className="mb-2 text-lg font-semibold">
        E-mails to the rider
      </h2>
      <EmailStatusItems emails={emails} />
    </section>
  );
}

export function PhotosPanel({ photos }: { photos: RequestDetail["photos"] }) {
  if (photos.length === 0) return null;
  return (
    <section aria-labelledby="photos-heading" className={box}>
      <h2 id="photos-heading" className="mb-2 text-lg font-semibold">
        Photos
      </h2>
      <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3">
        {photos.map((p) => (
          <li key={p.id}>
            <a href={`/api/uploads/${p.id}`} target="_blank" rel="noreferrer" className="block">
              {/* eslint-disable-next-line @next/next/no-img-element -- served by our own upload route with its access check */}
              <img
                src={`/api/uploads/${p.id}`}
                alt={`Rider's photo ${p.originalName}`}
                className="aspect-square w-full rounded-lg object-cover"
                loading="lazy"
              />
              <span className="mt-1 block truncate text-xs text-stone-600">{p.originalName}</span>
            </a>
          </li>
        ))}
      </ul>
    </section>
  );
}

interface VerdictLike {
  end?: string;
  verdict?: string;
  message?: string;
}

/** Verdicts may be stored per end ({ front, rear }) or as one verdict; collect whatever is there. */
function verdictsIn(value: unknown): VerdictLike[] {
  if (!value || typeof value !== "object") return [];
  const v = value as Record<string, unknown>;
  if (typeof v.message === "string") return [v as VerdictLike];
  return Object.values(v).flatMap(verdictsIn);
}

function measuredText(value: unknown, prefix = ""): string[] {
  if (value === null || value === undefined) return [];
  if (typeof value !== "object") return [`${prefix}: ${String(value)}`];
  return Object.entries(value as Record<string, unknown>).flatMap(([k, v]) =>
    measuredText(v, prefix ? `${prefix} ${k}` : k),
  );
}

const VERDICT_WORDS: Record<string, string> = {
  "too-soft": "Too soft",
  right: "Right",
  "too-stiff": "Too stiff",
  recheck: "Measure again",
};

export function SagReportsPanel({ reports }: { reports: RequestDetail["sagReports"] }) {
  return (
    <section aria-labelledby="sag-heading" className={box}>
      <h2 id="sag-heading" className="mb-2 text-lg font-semibold">
        Sag reports from the rider
      </h2>
      {reports.length === 0 ? <p className="text-sm text-stone-600">No measured sag reported yet.</p> : null}
      <ol className="flex flex-col gap-3 text-sm">
        {reports.map((r) => (
          <li key={r.id} className="rounded-lg border border-stone-200 p-2">
            <p className="text-stone-600">{formatDateTime(r.createdAt)}</p>
            <p>Measured: {measuredText(r.measured).join("; ")}</p>
            <ul className="mt-1 flex flex-col gap-1">
              {verdictsIn(r.verdict).map((v, i) => (
                <li key={i}>
                  <span className="font-semibold">
                    {v.end ? `${v.end === "front" ? "Fork" : "Shock"}: ` : ""}
                    {VERDICT_WORDS[v.verdict ?? ""] ?? v.verdict ?? ""}
                  </span>{" "}
                  {v.message}
                </li>
              ))}
            </ul>
          </li>
        ))}
      </ol>
    </section>
  );
}
