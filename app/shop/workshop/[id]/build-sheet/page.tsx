import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { BuildNotesForm } from "@/components/workshop/build-notes-form";
import { PrintButton } from "@/components/workshop/print-button";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { NotFoundError } from "@/lib/errors";
import { loadBuildSheet } from "@/lib/orders/build-sheet";
import { isUuid } from "@/lib/validations/id";

export const metadata: Metadata = { title: "Build sheet" };
export const dynamic = "force-dynamic";

const cell = "border-b border-stone-200 py-1 pr-3";

export default async function BuildSheetPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  await requireRole(STAFF_ROLES, { page: `/shop/workshop/${id}/build-sheet` });
  if (!isUuid(id)) notFound();
  const sheet = await loadBuildSheet(id.toLowerCase()).catch((error: unknown) => {
    if (error instanceof NotFoundError) notFound();
    throw error;
  });
  return (
    <article className="flex max-w-3xl flex-col gap-4 print:text-sm">
      <header className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <h1 className="text-2xl font-bold">
            Build sheet · order {sheet.orderNumber} · {sheet.serviceLabel}
          </h1>
          <p className="text-stone-700">
            {sheet.riderName} · {sheet.bike} · request {sheet.requestNumber}
            {sheet.sheetVersion ? `, sheet version ${sheet.sheetVersion}` : ""}
          </p>
        </div>
        <div className="flex gap-2 print:hidden">
          <PrintButton />
          <a
            href={`/api/orders/${id}/build-sheet`}
            className="inline-flex min-h-11 items-center rounded-lg border border-stone-300 px-4 font-semibold"
          >
            PDF
          </a>
        </div>
      </header>
      <section aria-labelledby="parts-heading">
        <h2 id="parts-heading" className="text-lg font-semibold">
          Parts to pick
        </h2>
        <table className="w-full text-left">
          <tbody>
            {sheet.springs.map((p, i) => (
              <tr key={`s${i}`}>
                <td className={cell}>{p.quantity} ×</td>
                <td className={cell}>{p.what}</td>
                <td className={`${cell} font-semibold`}>{p.rate}</td>
                <td className={cell}>free length {p.freeLength}</td>
              </tr>
            ))}
            {sheet.parts.map((p, i) => (
              <tr key={`p${i}`}>
                <td className={cell}>{p.quantity} ×</td>
                <td className={cell} colSpan={3}>
                  {p.what}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>
      <section aria-labelledby="figures-heading">
        <h2 id="figures-heading" className="text-lg font-semibold">
          Figures from the approved sheet
        </h2>
        <dl className="grid grid-cols-2 gap-x-4">
          {sheet.figures.map(([label, value]) => (
            <div key={label} className="contents">
              <dt className={cell}>{label}</dt>
              <dd className={`${cell} font-semibold`}>{value}</dd>
            </div>
          ))}
        </dl>
      </section>
      <section aria-labelledby="notes-heading">
        <h2 id="notes-heading" className="text-lg font-semibold">
          Build notes{sheet.bikeModelName ? ` for ${sheet.bikeModelName}` : ""}
        </h2>
        <p className="whitespace-pre-line">{sheet.buildNotes || "No build notes for this model yet."}</p>
        {sheet.bikeModelId ? <BuildNotesForm bikeModelId={sheet.bikeModelId} notes={sheet.buildNotes ?? ""} /> : null}
      </section>
      <section aria-labelledby="steps-heading">
        <h2 id="steps-heading" className="text-lg font-semibold">
          Steps
        </h2>
        <ul className="flex flex-col gap-1">
          {sheet.steps.map((step) => (
            <li key={step}>
              <label className="flex min-h-11 items-center gap-2">
                <input type="checkbox" className="size-5" /> {step}
              </label>
            </li>
          ))}
        </ul>
      </section>
      <aside role="note" aria-label="Safety" className="rounded-xl border-2 border-amber-500 p-3">
        {sheet.cautions.map((c) => (
          <p key={c}>⚠ {c}</p>
        ))}
      </aside>
      <p className="grid grid-cols-2 gap-4">
        <span>Built by: {sheet.builtBy ?? "________________"}</span>
        <span>Tested by: {sheet.testedBy ?? "________________"}</span>
      </p>
    </article>
  );
}
