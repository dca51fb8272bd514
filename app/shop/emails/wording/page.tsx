import type { Metadata } from "next";
import { WordingEditor } from "@/components/emails/wording-editor";
import { requireRole } from "@/lib/auth/guard";
import { listRiderEmailWording } from "@/lib/shop/email-wording";

export const metadata: Metadata = { title: "E-mail wording" };
export const dynamic = "force-dynamic";

// The owner writes the rider e-mails' heading and opening paragraph in the shop's own words; the
// rest of each e-mail (links, cautions, the tuner's question) stays as built.
export default async function EmailWordingPage() {
  await requireRole(["admin"], { page: "/shop/emails/wording" });
  const rows = await listRiderEmailWording();
  return (
    <div className="flex flex-col gap-6">
      <div>
        <h1 className="text-2xl font-bold">E-mail wording</h1>
        <p className="mt-1 max-w-prose text-stone-700">
          The heading and opening paragraph of each e-mail a rider gets, in your shop&apos;s words. Preview shows the
          e-mail with your shop&apos;s name and invented demo data; Save applies to the e-mails sent from then on.
        </p>
      </div>
      {rows.map((row) => (
        <WordingEditor key={row.template} row={row} />
      ))}
    </div>
  );
}
