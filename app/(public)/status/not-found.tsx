import Link from "next/link";

export default function StatusNotFound() {
  return (
    <div className="flex flex-col gap-3">
      <h1 className="text-2xl font-bold">This link does not open a request</h1>
      <p className="text-stone-700">
        Check that the whole link from the e-mail was copied. You can also sign in with the e-mail you used to see all
        your requests.
      </p>
      <Link href="/my-requests" className="inline-flex min-h-11 items-center font-semibold text-pine-700 underline">
        See my requests
      </Link>
    </div>
  );
}
