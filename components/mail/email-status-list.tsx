// The e-mails of one request with how each went: a failed one stands out in words, colour and
// border, with its attempts and the last error, so the tuner knows to reach the rider another way.
import type { OutboundEmailRow } from "@/db/queries/outbound-emails";
import type { EmailStatus } from "@/db/schema";
import { emailTemplates } from "@/emails";
import { formatDateTime } from "@/lib/format";

const STATUS_TEXT: Record<EmailStatus, string> = { sent: "Sent", queued: "Sending", failed: "Failed" };
const STATUS_CLASS: Record<EmailStatus, string> = {
  sent: "bg-pine-50 text-pine-800 ring-pine-600/30",
  queued: "bg-amber-50 text-amber-900 ring-amber-600/30",
  failed: "bg-red-50 text-red-900 ring-red-600/40",
};

function templateLabel(name: string): string {
  return (emailTemplates as Record<string, { description: string }>)[name]?.description ?? name;
}

function EmailItem({ mail }: { mail: OutboundEmailRow }) {
  const failed = mail.status === "failed";
  return (
    <li className={`rounded-lg border p-3 ${failed ? "border-red-300 bg-red-50/40" : "border-stone-200 bg-white"}`}>
      <div className="flex flex-wrap items-center gap-2">
        <span
          className={`inline-flex items-center rounded-full px-2.5 py-0.5 text-sm font-medium ring-1 ${STATUS_CLASS[mail.status]}`}
        >
          {STATUS_TEXT[mail.status]}
        </span>
        <span className="font-medium">{mail.subject}</span>
      </div>
      <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 text-sm text-stone-700">
        <dt>Kind</dt>
        <dd>{templateLabel(mail.template)}</dd>
        <dt>To</dt>
        <dd className="break-all">{mail.toAddress}</dd>
        <dt>{mail.sentAt ? "Sent" : "Created"}</dt>
        <dd>
          <time dateTime={(mail.sentAt ?? mail.createdAt).toISOString()}>
            {formatDateTime(mail.sentAt ?? mail.createdAt)}
          </time>
        </dd>
        <dt>Attempts</dt>
        <dd>{mail.attempts}</dd>
      </dl>
      {failed ? (
        <p role="alert" className="mt-2 text-sm text-red-900">
          Not delivered after {mail.attempts} {mail.attempts === 1 ? "attempt" : "attempts"}
          {mail.lastError ? `: ${mail.lastError}` : "."} Reach the rider another way.
        </p>
      ) : null}
    </li>
  );
}

export function EmailStatusItems({ emails }: { emails: OutboundEmailRow[] }) {
  if (emails.length === 0) return <p className="text-stone-600">No e-mails sent for this request yet.</p>;
  return (
    <ul className="flex flex-col gap-2" aria-label="E-mails sent for this request">
      {emails.map((mail) => (
        <EmailItem key={mail.id} mail={mail} />
      ))}
    </ul>
  );
}
