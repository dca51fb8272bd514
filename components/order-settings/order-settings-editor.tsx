"use client";

import { Form } from "@/components/ui/form";

// The admin's order settings: payment and tax, the stages that e-mail the rider, packing
// instructions for send-in orders, the price list (prices typed in the currency's major unit), and
// the outside finishers. Each part saves on its own through the API.
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { useOrderAction } from "@/components/workshop/use-order-action";
import { currencyDigits, parseMajorToMinor } from "@/lib/orders/money";
import {
  ORDER_STAGES,
  PRICE_KINDS,
  PRICE_KIND_LABELS,
  RIDER_STAGE_WORDS,
  type OrderStage,
  type PriceKind,
} from "@/lib/orders/stages";
import { ScrollBox } from "@/components/ui/scroll-box";

const box = "flex flex-col gap-3 rounded-xl border border-stone-200 bg-white p-4";

interface Settings {
  currency: string;
  taxRateBp: number;
  paymentMode: "full" | "deposit";
  depositPercent: number;
  notifyStages: OrderStage[];
  packingInstructions: string | null;
}
interface PriceItem {
  code: string;
  label: string;
  kind: PriceKind;
  unitPriceMinor: number;
  active: boolean;
  sortOrder: number;
}
interface Finisher {
  id: string;
  name: string;
  work: string;
  turnaroundDays: number;
  active: boolean;
}

function Outcome({ problem, done }: { problem: string | null; done: string | null }) {
  if (problem)
    return (
      <p role="alert" className="text-sm font-medium text-red-700">
        {problem}
      </p>
    );
  return done ? (
    <p role="status" className="text-sm text-emerald-800">
      {done}
    </p>
  ) : null;
}

export function OrderSettingsEditor(props: { settings: Settings; priceList: PriceItem[]; finishers: Finisher[] }) {
  return (
    <div className="grid grid-cols-1 gap-4 lg:grid-cols-2">
      <PaymentSettings settings={props.settings} />
      <PriceList items={props.priceList} currency={props.settings.currency} />
      <Finishers finishers={props.finishers} />
    </div>
  );
}

function PaymentSettings({ settings }: { settings: Settings }) {
  const { busy, problem, fields, done, send } = useOrderAction();
  const [taxError, setTaxError] = useState<string | undefined>();
  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    // The rate is typed as a percentage with up to two decimals and stored in basis points.
    const tax = String(form.get("taxRate") ?? "")
      .trim()
      .replace(",", ".");
    const taxRateBp = /^\d{1,3}(\.\d{1,2})?$/.test(tax) ? Math.round(Number(tax) * 100) : null;
    setTaxError(taxRateBp === null ? "Enter the tax rate as a percentage, e.g. 20 or 7.7" : undefined);
    if (taxRateBp === null) return;
    await send(
      "/api/shop/orders-settings",
      "PUT",
      {
        currency: String(form.get("currency") ?? ""),
        taxRateBp,
        paymentMode: form.get("paymentMode") === "deposit" ? "deposit" : "full",
        depositPercent: Number(form.get("depositPercent")),
        notifyStages: ORDER_STAGES.filter((s) => form.get(`notify-${s}`) === "on"),
        packingInstructions: String(form.get("packingInstructions") ?? "").trim() || null,
      },
      "Settings saved. New orders use them; orders already made keep their prices and tax.",
    );
  }
  return (
    <section className={box} aria-labelledby="payment-heading">
      <h2 id="payment-heading" className="text-lg font-semibold">
        Payment and tax
      </h2>
      <Form onSubmit={submit} className="flex flex-col gap-3" noValidate aria-label="Payment and tax">
        <Field
          id="currency"
          name="currency"
          label="Currency (ISO 4217 code)"
          defaultValue={settings.currency}
          error={fields.currency}
        />
        <Field
          id="taxRate"
          name="taxRate"
          inputMode="decimal"
          label="Tax rate (%)"
          hint="Added on top of the net prices of the price list."
          defaultValue={(settings.taxRateBp / 100).toString()}
          error={taxError ?? fields.taxRateBp}
        />
        <fieldset className="flex flex-col gap-1">
          <legend className="text-sm font-medium">The rider pays</legend>
          <label className="flex min-h-11 items-center gap-2">
            <input type="radio" name="paymentMode" value="full" defaultChecked={settings.paymentMode === "full"} /> the
            whole total
          </label>
          <label className="flex min-h-11 items-center gap-2">
            <input
              type="radio"
              name="paymentMode"
              value="deposit"
              defaultChecked={settings.paymentMode === "deposit"}
            />{" "}
            a deposit first, the rest before shipping
          </label>
        </fieldset>
        <Field
          id="depositPercent"
          name="depositPercent"
          inputMode="numeric"
          label="Deposit (% of the total)"
          defaultValue={String(settings.depositPercent)}
          error={fields.depositPercent}
        />
        <fieldset className="flex flex-col gap-1">
          <legend className="text-sm font-medium">E-mail the rider when the order reaches</legend>
          {ORDER_STAGES.map((s) => (
            <label key={s} className="flex min-h-11 items-center gap-2">
              <input type="checkbox" name={`notify-${s}`} defaultChecked={settings.notifyStages.includes(s)} />{" "}
              {RIDER_STAGE_WORDS[s]}
            </label>
          ))}
        </fieldset>
        <label htmlFor="packingInstructions" className="text-sm font-medium">
          Packing instructions for send-in orders (empty: the standard text)
        </label>
        <textarea
          id="packingInstructions"
          name="packingInstructions"
          rows={4}
          defaultValue={settings.packingInstructions ?? ""}
          className="rounded-lg border border-stone-300 p-2"
        />
        <Outcome problem={problem} done={done} />
        <Button type="submit" disabled={busy}>
          Save payment and tax
        </Button>
      </Form>
    </section>
  );
}

function PriceList({ items, currency }: { items: PriceItem[]; currency: string }) {
  const digits = currencyDigits(currency);
  const [rows, setRows] = useState(() =>
    items.map((i) => ({ ...i, price: (i.unitPriceMinor / 10 ** digits).toFixed(digits) })),
  );
  const [local, setLocal] = useState<Record<string, string>>({});
  const { busy, problem, fields, done, send } = useOrderAction();
  const errors = { ...fields, ...local };
  const update = (index: number, patch: Partial<(typeof rows)[number]>) =>
    setRows((all) => all.map((r, i) => (i === index ? { ...r, ...patch } : r)));
  async function save() {
    const wrong: Record<string, string> = {};
    const out = rows.map((r, i) => {
      const unitPriceMinor = parseMajorToMinor(r.price, currency);
      if (unitPriceMinor === null) wrong[`items.${i}.unitPriceMinor`] = "Enter the price as a number, e.g. 62.00";
      return {
        code: r.code,
        label: r.label,
        kind: r.kind,
        unitPriceMinor: unitPriceMinor ?? 0,
        active: r.active,
        sortOrder: i,
      };
    });
    setLocal(wrong);
    if (Object.keys(wrong).length) return;
    await send("/api/shop/price-list", "PUT", { items: out }, "Price list saved.");
  }
  return (
    <section className={box} aria-labelledby="prices-heading">
      <h2 id="prices-heading" className="text-lg font-semibold">
        Price list (net, {currency})
      </h2>
      <p className="text-sm text-stone-600">
        Quotes start from the items coded service-send-in, service-kit, service-springs-only, spring-fork, spring-shock
        and shipping-return; staff add the others by hand.
      </p>
      <ScrollBox label="Price list">
        <table className="w-full min-w-[34rem] text-sm">
          <thead>
            <tr className="text-left text-stone-600">
              <th scope="col">Code</th>
              <th scope="col">Name</th>
              <th scope="col">Kind</th>
              <th scope="col">Price</th>
              <th scope="col">Offered</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r, i) => (
              <tr key={i} className="align-top">
                <td className="py-1 pr-1">
                  <input
                    aria-label={`Item ${i + 1} code`}
                    value={r.code}
                    onChange={(e) => update(i, { code: e.target.value })}
                    className="min-h-11 w-32 rounded-lg border border-stone-300 px-2"
                  />
                  {errors[`items.${i}.code`] ? (
                    <p className="text-xs text-red-700">{errors[`items.${i}.code`]}</p>
                  ) : null}
                </td>
                <td className="py-1 pr-1">
                  <input
                    aria-label={`Item ${i + 1} name`}
                    value={r.label}
                    onChange={(e) => update(i, { label: e.target.value })}
                    className="min-h-11 w-full rounded-lg border border-stone-300 px-2"
                  />
                  {errors[`items.${i}.label`] ? (
                    <p className="text-xs text-red-700">{errors[`items.${i}.label`]}</p>
                  ) : null}
                </td>
                <td className="py-1 pr-1">
                  <select
                    aria-label={`Item ${i + 1} kind`}
                    value={r.kind}
                    onChange={(e) => update(i, { kind: e.target.value as PriceKind })}
                    className="min-h-11 rounded-lg border border-stone-300 px-1"
                  >
                    {PRICE_KINDS.map((k) => (
                      <option key={k} value={k}>
                        {PRICE_KIND_LABELS[k]}
                      </option>
                    ))}
                  </select>
                </td>
                <td className="py-1 pr-1">
                  <input
                    aria-label={`Item ${i + 1} price`}
                    inputMode="decimal"
                    value={r.price}
                    onChange={(e) => update(i, { price: e.target.value })}
                    className="min-h-11 w-24 rounded-lg border border-stone-300 px-2"
                  />
                  {errors[`items.${i}.unitPriceMinor`] ? (
                    <p className="text-xs text-red-700">{errors[`items.${i}.unitPriceMinor`]}</p>
                  ) : null}
                </td>
                <td className="py-1 text-center">
                  <input
                    type="checkbox"
                    aria-label={`Item ${i + 1} offered`}
                    checked={r.active}
                    onChange={(e) => update(i, { active: e.target.checked })}
                    className="size-5"
                  />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollBox>
      <div className="flex flex-wrap gap-2">
        <Button
          variant="secondary"
          onClick={() =>
            setRows((all) => [
              ...all,
              { code: "", label: "", kind: "part", unitPriceMinor: 0, active: true, sortOrder: all.length, price: "" },
            ])
          }
        >
          Add an item
        </Button>
        <Button onClick={save} disabled={busy}>
          Save price list
        </Button>
      </div>
      <Outcome problem={problem} done={done} />
    </section>
  );
}

function Finishers({ finishers }: { finishers: Finisher[] }) {
  const { busy, problem, fields, done, send } = useOrderAction();
  async function add(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const days = Number(String(form.get("turnaroundDays") ?? "").trim());
    if (
      await send(
        "/api/shop/finishers",
        "POST",
        { name: String(form.get("name") ?? ""), work: String(form.get("work") ?? ""), turnaroundDays: days },
        "Finisher added.",
      )
    )
      event.currentTarget?.reset();
  }
  return (
    <section className={box} aria-labelledby="finishers-heading">
      <h2 id="finishers-heading" className="text-lg font-semibold">
        Outside finishers
      </h2>
      <ul className="flex flex-col gap-2">
        {finishers.map((f) => (
          <li key={f.id} className="flex flex-wrap items-center gap-2 text-sm">
            <span className={f.active ? "" : "text-stone-600 line-through"}>
              {f.name}: {f.work}, usually {f.turnaroundDays} days
            </span>
            <Button
              variant="ghost"
              className="min-h-9 px-2 text-sm"
              disabled={busy}
              onClick={() =>
                send(
                  `/api/shop/finishers/${f.id}`,
                  "PATCH",
                  { active: !f.active },
                  f.active ? "Finisher set aside." : "Finisher back in use.",
                )
              }
            >
              {f.active ? `Stop using ${f.name}` : `Use ${f.name} again`}
            </Button>
          </li>
        ))}
      </ul>
      <Form onSubmit={add} className="flex flex-col gap-3" noValidate aria-label="Add a finisher">
        <Field id="finisher-name" name="name" label="Name" error={fields.name} />
        <Field id="finisher-work" name="work" label="What they do" error={fields.work} />
        <Field
          id="finisher-days"
          name="turnaroundDays"
          inputMode="numeric"
          label="Usual turnaround (days)"
          error={fields.turnaroundDays}
        />
        <Outcome problem={problem} done={done} />
        <Button type="submit" disabled={busy}>
          Add finisher
        </Button>
      </Form>
    </section>
  );
}
