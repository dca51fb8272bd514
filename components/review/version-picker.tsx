// Every version of the recommendation, the shown one marked; each with its sheet link.
import Link from "next/link";
import { sheetPath } from "@/lib/requests/token";
import { formatDay } from "@/lib/format";

const STATE_WORDS = { draft: "Draft", approved: "Approved", superseded: "Superseded" } as const;

export interface VersionSummary {
  version: number;
  state: keyof typeof STATE_WORDS;
  createdAt: Date;
  approvedAt: Date | null;
  approvedByName: string | null;
}

export function sheetLinkFor(requestId: string, v: { version: number; state: string }) {
  return v.state === "draft"
    ? {
        href: `/api/requests/${requestId}/sheet?version=${v.version}&preview=1`,
        label: `Preview sheet (draft) v${v.version}`,
      }
    : { href: sheetPath(requestId, v.version), label: `Setup sheet v${v.version} (PDF)` };
}

export function VersionPicker({
  requestId,
  versions,
  shown,
}: {
  requestId: string;
  versions: VersionSummary[];
  shown: number;
}) {
  return (
    <nav aria-label="Versions" className="rounded-xl border border-stone-200 bg-white p-4">
      <h2 className="mb-2 text-lg font-semibold">Versions</h2>
      <ul className="flex flex-col gap-2 text-sm">
        {[...versions].reverse().map((v) => {
          const sheet = sheetLinkFor(requestId, v);
          return (
            <li key={v.version} className="flex flex-wrap items-center gap-x-3 gap-y-1">
              <Link
                href={`/shop/requests/${requestId}?version=${v.version}`}
                aria-current={v.version === shown ? "page" : undefined}
                className={`inline-flex min-h-11 items-center rounded-lg px-2 underline-offset-2 hover:underline ${v.version === shown ? "bg-pine-50 font-semibold" : ""}`}
              >
                Version {v.version}: {STATE_WORDS[v.state]}
              </Link>
              <span className="text-stone-600">
                {v.approvedAt
                  ? `approved ${formatDay(v.approvedAt)}${v.approvedByName ? ` by ${v.approvedByName}` : ""}`
                  : `made ${formatDay(v.createdAt)}`}
              </span>
              <a
                href={sheet.href}
                className="inline-flex min-h-11 items-center text-pine-700 underline"
                target="_blank"
                rel="noreferrer"
              >
                {sheet.label}
              </a>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
