import Link from "next/link";

export default function BikeNotFound() {
  return (
    <div className="flex flex-col gap-3">
      <h1 className="text-2xl font-bold">No such bike model</h1>
      <p>The link may be old, or the model was never saved.</p>
      <Link href="/shop/catalog" className="inline-flex min-h-11 items-center text-pine-700 underline">
        Back to the catalog
      </Link>
    </div>
  );
}
