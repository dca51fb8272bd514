import Link from "next/link";

export default function InviteNotFound() {
  return (
    <div className="flex flex-col gap-3">
      <h1 className="text-2xl font-bold">This invitation link is not valid</h1>
      <p>Check that the whole link was copied from the e-mail, or ask the shop admin for a new invitation.</p>
      <Link href="/sign-in" className="inline-flex min-h-11 items-center text-pine-700 underline">
        Go to sign-in
      </Link>
    </div>
  );
}
