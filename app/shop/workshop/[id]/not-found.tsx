import Link from "next/link";

export default function RequestNotFound() {
  return (
    <div className="rounded-xl border border-stone-200 bg-white p-6">
      <h1 className="text-lg font-semibold">No such order</h1>
      <p className="mt-1 text-stone-700">The link may be mistyped, or the order was removed.</p>
      <Link href="/shop/workshop" className="mt-4 inline-flex min-h-11 items-center text-pine-700 underline">
        Back to the workshop board
      </Link>
    </div>
  );
}
