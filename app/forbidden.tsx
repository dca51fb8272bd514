import Link from "next/link";

export default function Forbidden() {
  return (
    <main className="mx-auto max-w-xl px-4 py-16">
      <h1 className="text-2xl font-bold">Not for this account</h1>
      <p className="mt-2 text-stone-700">
        This part of Sagwise is for shop staff. Riders find their requests under “My requests”.
      </p>
      <Link
        href="/my-requests"
        className="mt-6 inline-flex min-h-11 items-center font-semibold text-pine-700 underline"
      >
        Go to my requests
      </Link>
    </main>
  );
}
