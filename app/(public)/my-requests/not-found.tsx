import Link from "next/link";

export default function MyRequestNotFound() {
  return (
    <div className="flex flex-col gap-3">
      <h1 className="text-2xl font-bold">No such request for this e-mail</h1>
      <p className="text-stone-700">Requests open here only for the e-mail address they were made with.</p>
      <Link href="/my-requests" className="inline-flex min-h-11 items-center font-semibold text-pine-700 underline">
        All my requests
      </Link>
    </div>
  );
}
