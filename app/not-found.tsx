import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto max-w-xl px-4 py-16">
      <h1 className="text-2xl font-bold">Page not found</h1>
      <p className="mt-2 text-stone-700">The link may be old or mistyped.</p>
      <Link href="/" className="mt-6 inline-flex min-h-11 items-center font-semibold text-pine-700 underline">
        Back to the start
      </Link>
    </main>
  );
}
