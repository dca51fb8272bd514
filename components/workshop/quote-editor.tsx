"use client";

// The quote's lines for staff, editable until the rider accepts: description, quantity and unit
// price (typed in the currency's major unit, with a point or a comma), lines from the price list.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { formatMoney } from "@/lib/format";
import { currencyDigits, parseMajorToMinor } from "@/lib/orders/money";
import type { OrderView } from "@/lib/orders/types";
import { useOrderAction } from "./use-order-action";
import { ScrollBox } from "@/components/ui/scroll-box";

interface Row {
  key: number;
  priceItemId?: string | null;
  description: string;
  quantity: string;
  price: string;
}

export function QuoteEditor({
  order,
  priceList,
}: {
  order: OrderView;
  priceList: { id: string; label: string; unitPriceMinor: number }[];
}) {
  const digits = currencyDigits(order.currency);
  const major = (minor: number) => (minor / 10 ** digits).toFixed(digits);
  const [rows, setRows] = useState<Row[]>(() =>
    order.lines.map((l, i) => ({
      key: i,
      priceItemId: l.priceItemId,
      description: l.description,
      quantity: String(l.quantity),
      price: major(l.unitPriceMinor),
    })),
  );
  const [rowErrors, setRowErrors] = useState<Record<string, string>>({});
  const { busy, problem, fields, done, send } = useOrderAction();
  const errors = { ...fields, ...rowErrors };
  const update = (key: number, patch: Partial<Row>) =>
    setRows((all) => all.map((r) => (r.key === key ? { ...r, ...patch } : r)));
  const nextKey = () => Math.max(0, ...rows.map((r) => r.key)) + 1;

  async function save() {
    const local: Record<string, string> = {};
    const lines = rows.map((r, i) => {
      const unitPriceMinor = parseMajorToMinor(r.price, order.currency);
      if (unitPriceMinor === null) local[`lines.${i}.unitPriceMinor`] = "Enter the price as a number, e.g. 62.00";
      const quantity = Number(r.quantity);
      if (!Number.isInteger(quantity)) local[`lines.${i}.quantity`] = "Enter the quantity as a whole number";
      return {
        ...(r.priceItemId ? { priceItemId: r.priceItemId } : {}),
        description: r.description,
        quantity,
        unitPriceMinor: unitPriceMinor ?? 0,
      };
    });
    setRowErrors(local);
    if (Object.keys(local).length) return;
    await send(`/api/orders/${order.id}/lines`, "PUT", { lines }, "Quote saved.");
  }

  return (
    <div className="flex flex-col gap-3">
      <ScrollBox label="Quote lines">
        <table className="w-full min-w-[36rem] text-sm">
          <thead>
            <tr className="text-left text-stone-600">
              <th scope="col">Item</th>
              <th scope="col">Qty</th>
              <th scope="col">Unit price ({order.currency})</th>
              <th scope="col">
                <span className="sr-only">Remove</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r, i) => (
              <tr key={r.key} className="align-top">
                <td className="py-1 pr-2">
                  <input
                    aria-label={`Line ${i + 1} item`}
                    value={r.description}
                    onChange={(e) => update(r.key, { description: e.target.value })}
                    className="min-h-11 w-full rounded-lg border border-stone-300 px-2"
                  />
                  <LineError message={errors[`lines.${i}.description`]} />
                </td>
                <td className="w-20 py-1 pr-2">
                  <input
                    aria-label={`Line ${i + 1} quantity`}
                    inputMode="numeric"
                    value={r.quantity}
                    onChange={(e) => update(r.key, { quantity: e.target.value })}
                    className="min-h-11 w-full rounded-lg border border-stone-300 px-2"
                  />
                  <LineError message={errors[`lines.${i}.quantity`]} />
                </td>
                <td className="w-32 py-1 pr-2">
                  <input
                    aria-label={`Line ${i + 1} unit price`}
                    inputMode="decimal"
                    value={r.price}
                    onChange={(e) => update(r.key, { price: e.target.value })}
                    className="min-h-11 w-full rounded-lg border border-stone-300 px-2"
                  />
                  <LineError message={errors[`lines.${i}.unitPriceMinor`]} />
                </td>
                <td className="py-1">
                  <Button
                    variant="ghost"
                    aria-label={`Remove line ${i + 1}`}
                    onClick={() => setRows((all) => all.filter((x) => x.key !== r.key))}
                  >
                    ✕
                  </Button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollBox>
      <div className="flex flex-wrap items-end gap-2">
        <label className="flex flex-col text-sm">
          Add from the price list
          <select
            className="min-h-11 rounded-lg border border-stone-300 px-2"
            value=""
            onChange={(e) => {
              const item = priceList.find((p) => p.id === e.target.value);
              if (item)
                setRows((all) => [
                  ...all,
                  {
                    key: nextKey(),
                    priceItemId: item.id,
                    description: item.label,
                    quantity: "1",
                    price: major(item.unitPriceMinor),
                  },
                ]);
            }}
          >
            <option value="">Choose…</option>
            {priceList.map((p) => (
              <option key={p.id} value={p.id}>
                {p.label} ({formatMoney(p.unitPriceMinor, order.currency)})
              </option>
            ))}
          </select>
        </label>
        <Button
          variant="secondary"
          onClick={() => setRows((all) => [...all, { key: nextKey(), description: "", quantity: "1", price: "" }])}
        >
          Add a line
        </Button>
        <Button onClick={save} disabled={busy}>
          Save quote
        </Button>
      </div>
      {problem ? (
        <p role="alert" className="text-sm font-medium text-red-700">
          {problem}
        </p>
      ) : done ? (
        <p role="status" className="text-sm text-emerald-800">
          {done}
        </p>
      ) : null}
    </div>
  );
}

function LineError({ message }: { message?: string }) {
  return message ? (
    <p role="alert" className="text-xs font-medium text-red-700">
      {message}
    </p>
  ) : null;
}
