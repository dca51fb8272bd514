// The quote's lines with their amounts, the subtotal, tax and total, written by lib/format.
import { formatMoney } from "@/lib/format";
import type { OrderView } from "@/lib/orders/types";
import { ScrollBox } from "@/components/ui/scroll-box";

export function QuoteTable({ order }: { order: OrderView }) {
  const money = (minor: number) => formatMoney(minor, order.currency);
  return (
    <ScrollBox label="Quote">
      <table className="w-full text-left text-sm">
        <thead>
          <tr className="border-b border-stone-200 text-stone-600">
            <th scope="col" className="py-1 pr-2 font-medium">
              Item
            </th>
            <th scope="col" className="py-1 pr-2 text-right font-medium">
              Qty
            </th>
            <th scope="col" className="py-1 text-right font-medium">
              Amount
            </th>
          </tr>
        </thead>
        <tbody>
          {order.lines.map((l) => (
            <tr key={l.id} className="border-b border-stone-100">
              <td className="py-1 pr-2">{l.description}</td>
              <td className="py-1 pr-2 text-right">{l.quantity}</td>
              <td className="py-1 text-right tabular-nums">{money(l.totalMinor)}</td>
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr>
            <th scope="row" colSpan={2} className="pt-2 pr-2 text-right font-medium">
              Subtotal
            </th>
            <td className="pt-2 text-right tabular-nums">{money(order.subtotalMinor)}</td>
          </tr>
          <tr>
            <th scope="row" colSpan={2} className="pr-2 text-right font-medium">
              Tax {(order.taxRateBp / 100).toFixed(2)} %
            </th>
            <td className="text-right tabular-nums">{money(order.taxMinor)}</td>
          </tr>
          <tr>
            <th scope="row" colSpan={2} className="pr-2 text-right font-bold">
              Total
            </th>
            <td className="text-right font-bold tabular-nums" data-testid="order-total">
              {money(order.totalMinor)}
            </td>
          </tr>
        </tfoot>
      </table>
    </ScrollBox>
  );
}
