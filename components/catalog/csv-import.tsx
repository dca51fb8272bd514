"use client";

import { Form } from "@/components/ui/form";

// Upload a catalog CSV; shows what was saved and, per refused row, each field and why.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { callApi } from "@/lib/api-client";
import { ScrollBox } from "@/components/ui/scroll-box";

interface Report {
  saved: { row: number; slug: string; action: string }[];
  refused: { row: number; slug: string | null; fields: Record<string, string> }[];
}

export function CsvImport() {
  const router = useRouter();
  const [report, setReport] = useState<Report | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function upload(form: HTMLFormElement) {
    setBusy(true);
    setError(null);
    setReport(null);
    const result = await callApi<Report>("/api/shop/catalog/csv", "POST", new FormData(form), {
      fallback: "The file could not be read.",
    });
    setBusy(false);
    if (!result.ok) return setError(result.error);
    setReport(result.data);
    router.refresh();
  }

  return (
    <section
      aria-labelledby="csv-heading"
      className="flex flex-col gap-3 rounded-xl border border-stone-200 bg-white p-4"
    >
      <h2 id="csv-heading" className="font-semibold">
        Import and export
      </h2>
      <p className="text-sm text-stone-600">
        The export holds every model, retired ones too. An import adds new slugs and replaces models with the same slug;
        each row is checked on its own, so a refused row never stops the others.
      </p>
      <div className="flex flex-wrap items-end gap-3">
        <a
          href="/api/shop/catalog/csv"
          className="inline-flex min-h-11 items-center rounded-lg border border-stone-300 px-4 font-semibold"
          download
        >
          Download CSV
        </a>
        <Form
          onSubmit={(e) => {
            e.preventDefault();
            void upload(e.currentTarget);
          }}
          className="flex flex-wrap items-end gap-2"
        >
          <label className="flex flex-col gap-1 text-sm font-medium">
            CSV file
            <input name="file" type="file" accept=".csv,text/csv" required className="min-h-11 text-sm" />
          </label>
          <Button type="submit" variant="secondary" disabled={busy}>
            {busy ? "Importing…" : "Import"}
          </Button>
        </Form>
      </div>
      {error ? (
        <p role="alert" className="rounded-lg bg-red-50 p-3 text-sm text-red-800">
          {error}
        </p>
      ) : null}
      {report ? (
        <div role="status" className="flex flex-col gap-2 text-sm">
          <p>
            {report.saved.length} row(s) saved, {report.refused.length} refused.
          </p>
          {report.refused.length ? (
            <ScrollBox label="Refused rows">
              <table className="text-left">
                <thead>
                  <tr>
                    <th scope="col" className="pr-3">
                      Row
                    </th>
                    <th scope="col" className="pr-3">
                      Slug
                    </th>
                    <th scope="col">What was wrong</th>
                  </tr>
                </thead>
                <tbody>
                  {report.refused.map((r) => (
                    <tr key={r.row} className="align-top">
                      <td className="pr-3 tabular-nums">{r.row}</td>
                      <td className="pr-3">{r.slug ?? "—"}</td>
                      <td>
                        <ul>
                          {Object.entries(r.fields).map(([f, m]) => (
                            <li key={f}>
                              <code>{f}</code>: {m}
                            </li>
                          ))}
                        </ul>
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </ScrollBox>
          ) : null}
        </div>
      ) : null}
    </section>
  );
}
