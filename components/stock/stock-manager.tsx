"use client";

// The shelf: fork and shock springs with rates in all three units, quantities and fit notes.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { callApi } from "@/lib/api-client";
import { rateTriple } from "@/lib/sizing";
import { ScrollBox } from "@/components/ui/scroll-box";
import { SpringForm } from "./spring-form";

export interface StockRow {
  id: string;
  end: "fork" | "shock";
  rateNmm: number;
  quantity: number;
  freeLengthMm: number | null;
  innerDiameterMm: number | null;
  fitNotes: string | null;
}

export function StockManager({ rows }: { rows: StockRow[] }) {
  const router = useRouter();
  const [editing, setEditing] = useState<string | null>(null);
  const done = () => {
    setEditing(null);
    router.refresh();
  };
  const remove = async (id: string, label: string) => {
    // Removing a line cannot be undone from here; ask first.
    if (!window.confirm(`Remove the ${label} spring line from the stock list?`)) return;
    if ((await callApi(`/api/shop/stock/${id}`, "DELETE")).ok) router.refresh();
  };
  return (
    <div className="flex flex-col gap-5">
      <section aria-labelledby="add-spring" className="rounded-xl border border-stone-200 bg-white p-4">
        <h2 id="add-spring" className="mb-3 font-semibold">
          Add a spring
        </h2>
        <SpringForm label="Add a spring" initial={{ end: "shock", rateUnit: "N/mm", quantity: 1 }} onDone={done} />
      </section>
      {(["fork", "shock"] as const).map((end) => (
        <section key={end} aria-labelledby={`${end}-springs`} className="rounded-xl border border-stone-200 bg-white">
          <h2 id={`${end}-springs`} className="px-3 pt-3 font-semibold">
            {end === "fork" ? "Fork springs (per leg)" : "Shock springs"}
          </h2>
          <ScrollBox label={end === "fork" ? "Fork springs" : "Shock springs"}>
            <table className="w-full text-left text-sm">
              <thead className="text-stone-600">
                <tr>
                  <th scope="col" className="px-3 py-2">
                    N/mm
                  </th>
                  <th scope="col" className="px-3 py-2">
                    kgf/mm
                  </th>
                  <th scope="col" className="px-3 py-2">
                    lbf/in
                  </th>
                  <th scope="col" className="px-3 py-2">
                    On the shelf
                  </th>
                  <th scope="col" className="px-3 py-2">
                    Free length / inner Ø (mm)
                  </th>
                  <th scope="col" className="px-3 py-2">
                    Fit notes
                  </th>
                  <th scope="col" className="px-3 py-2">
                    <span className="sr-only">Actions</span>
                  </th>
                </tr>
              </thead>
              <tbody>
                {rows
                  .filter((r) => r.end === end)
                  .map((r) => {
                    const t = rateTriple(r.rateNmm);
                    return editing === r.id ? (
                      <tr key={r.id} className="border-t border-stone-100">
                        <td colSpan={7} className="p-3">
                          <SpringForm
                            id={r.id}
                            label={`Edit spring ${t.nMm.toFixed(2)} N/mm`}
                            initial={{ ...r, rate: Math.round(r.rateNmm * 1000) / 1000, rateUnit: "N/mm" }}
                            onDone={done}
                          />
                        </td>
                      </tr>
                    ) : (
                      <tr key={r.id} className="border-t border-stone-100 tabular-nums">
                        <td className="px-3 py-2 font-medium">{t.nMm.toFixed(2)}</td>
                        <td className="px-3 py-2">{t.kgfMm.toFixed(3)}</td>
                        <td className="px-3 py-2">{t.lbfIn.toFixed(0)}</td>
                        <td className="px-3 py-2">{r.quantity === 0 ? "none (not offered)" : r.quantity}</td>
                        <td className="px-3 py-2">
                          {r.freeLengthMm ?? "—"} / {r.innerDiameterMm ?? "—"}
                        </td>
                        <td className="px-3 py-2">{r.fitNotes ?? ""}</td>
                        <td className="flex gap-1 px-3 py-1">
                          <Button
                            variant="ghost"
                            onClick={() => setEditing(r.id)}
                            aria-label={`Edit ${t.nMm.toFixed(2)} N/mm ${end} spring`}
                          >
                            Edit
                          </Button>
                          <Button
                            variant="ghost"
                            onClick={() => remove(r.id, `${t.nMm.toFixed(2)} N/mm ${end}`)}
                            aria-label={`Remove ${t.nMm.toFixed(2)} N/mm ${end} spring`}
                          >
                            Remove
                          </Button>
                        </td>
                      </tr>
                    );
                  })}
              </tbody>
            </table>
          </ScrollBox>
        </section>
      ))}
    </div>
  );
}
