import type { Metadata } from "next";
import { getShopName } from "@/db/queries/settings";
import { emailTemplateNames, emailTemplates } from "@/emails";
import Link from "next/link";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { renderTemplate } from "@/lib/mail";

export const metadata: Metadata = { title: "E-mails" };
export const dynamic = "force-dynamic";

// Every e-mail Sagwise sends, rendered with demo data exactly as the mail is built for sending:
// the html part in a sandboxed frame (no scripts, no navigation) and the plain-text part below it.
export default async function EmailPreviewsPage() {
  const user = await requireRole(STAFF_ROLES, { page: "/shop/emails" });
  // The shop's own name from its settings, as the real e-mails carry it; the rest is demo data.
  const shopName = await getShopName();
  const previews = await Promise.all(
    emailTemplateNames.map(async (name) => ({
      name,
      description: emailTemplates[name].description,
      ...(await renderTemplate(name, { ...emailTemplates[name].demoProps, shopName } as never)),
    })),
  );
  return (
    <div className="flex flex-col gap-6">
      <div>
        <h1 className="text-2xl font-bold">E-mails</h1>
        <p className="mt-1 max-w-prose text-stone-700">
          What riders and staff receive, with your shop&apos;s name and invented demo data for the rest. Each e-mail has
          an html part and a plain-text part for mail apps that show no html.
        </p>
      </div>
      {user.role === "admin" ? (
        <Link
          href="/shop/emails/wording"
          className="inline-flex min-h-11 items-center font-semibold text-pine-700 underline"
        >
          Write the rider e-mails in your shop&apos;s words
        </Link>
      ) : null}
      <ul className="flex flex-col gap-8">
        {previews.map((p) => (
          <li
            key={p.name}
            aria-labelledby={`email-${p.name}`}
            className="rounded-xl border border-stone-200 bg-white p-4"
          >
            <h2 id={`email-${p.name}`} className="text-lg font-semibold">
              {p.description}
            </h2>
            <p className="mt-2">
              <span className="font-medium">Subject:</span> {p.subject}
            </p>
            <iframe
              title={`${p.description}: html preview`}
              srcDoc={p.html}
              sandbox=""
              className="mt-3 h-[28rem] w-full rounded-lg border border-stone-200 bg-white"
            />
            <details className="mt-3">
              <summary className="inline-flex min-h-11 cursor-pointer items-center font-medium text-pine-700">
                Plain-text part
              </summary>
              <pre className="mt-2 whitespace-pre-wrap break-words rounded-lg bg-stone-50 p-3 text-sm">{p.text}</pre>
            </details>
          </li>
        ))}
      </ul>
    </div>
  );
}
