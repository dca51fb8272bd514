// Messages with the rider, e-mails sent about the request (failed ones stand out), photos and the
// rider's sag reports with the engine's verdicts.
import { EmailStatusItems } from "@/components/mail/email-status-list";
import type { RequestDetail } from "@/db/queries/review";
import { formatDateTime, formatNumber } from "@/lib/format";
import { END_LABELS, SAG_VERDICT_LABELS, labelOf } from "@/lib/labels";
import { ScrollBox } from "@/components/ui/scroll-box";

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
        E-mails about this request
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

type End = "front" | "rear";
interface EndReading {
  freeMm: number | null;
  staticMm: number;
  raceMm: number;
}
interface VerdictLike {
  verdict?: string;
  message?: string;
  preloadChangeMm?: number | null;
}

const mm = (v: number | null | undefined) => (typeof v === "number" ? `${formatNumber(v, 0)} mm` : "—");

/** The rider's measured sag per end, in mm, beside the engine's verdict (lib/requests/sag-follow-up.ts). */
export function SagReportsPanel({ reports }: { reports: RequestDetail["sagReports"] }) {
  return (
    <section aria-labelledby="sag-heading" className={box}>
      <h2 id="sag-heading" className="mb-2 text-lg font-semibold">
        Sag reports from the rider
      </h2>
      {reports.length === 0 ? <p className="text-sm text-stone-600">No measured sag reported yet.</p> : null}
      {reports.length ? (
        <ScrollBox label="Measured sag">
          <table className="w-full min-w-[34rem] text-left text-sm">
            <caption className="sr-only">Measured sag per report and end, with the verdict</caption>
            <thead className="bg-stone-100 text-stone-700">
              <tr>
                <th scope="col" className="px-2 py-1">
                  Reported
                </th>
                <th scope="col" className="px-2 py-1">
                  End
                </th>
                <th scope="col" className="px-2 py-1 text-right">
                  Free
                </th>
                <th scope="col" className="px-2 py-1 text-right">
                  Static
                </th>
                <th scope="col" className="px-2 py-1 text-right">
                  Race
                </th>
                <th scope="col" className="px-2 py-1">
                  Verdict
                </th>
              </tr>
            </thead>
            <tbody>
              {reports.flatMap((r) => {
                const readings = ((r.measured as { mm?: Partial<Record<End, EndReading>> } | null)?.mm ??
                  {}) as Partial<Record<End, EndReading>>;
                const verdicts = (r.verdict ?? {}) as Partial<Record<End, VerdictLike>>;
                return (["rear", "front"] as const)
                  .filter((end) => readings[end])
                  .map((end, i) => {
                    const m = readings[end]!;
                    const v = verdicts[end];
                    return (
                      <tr key={`${r.id}-${end}`} className="border-t border-stone-100 align-top">
                        <td className="px-2 py-1 whitespace-nowrap">{i === 0 ? formatDateTime(r.createdAt) : ""}</td>
                        <td className="px-2 py-1">{END_LABELS[end]}</td>
                        <td className="px-2 py-1 text-right tabular-nums">{mm(m.freeMm)}</td>
                        <td className="px-2 py-1 text-right tabular-nums">{mm(m.staticMm)}</td>
                        <td className="px-2 py-1 text-right tabular-nums">{mm(m.raceMm)}</td>
                        <td className="px-2 py-1">
                          <span className="font-semibold">{labelOf(SAG_VERDICT_LABELS, v?.verdict)}</span>
                          {v?.message ? <span className="block text-stone-700">{v.message}</span> : null}
                        </td>
                      </tr>
                    );
                  });
              })}
            </tbody>
          </table>
        </ScrollBox>
      ) : null}
    </section>
  );
}
