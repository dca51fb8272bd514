import Link from "next/link";

/** The settings page's way to the order settings (price list, finishers, tax, payment, e-mails). */
export function OrderSettingsLink() {
  return (
    <p>
      <Link
        href="/shop/settings/orders"
        className="inline-flex min-h-11 items-center font-semibold text-pine-700 underline"
      >
        Orders and payment: price list, finishers, tax, deposit, e-mails to the rider
      </Link>
    </p>
  );
}
