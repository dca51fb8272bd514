export default function Loading() {
  return (
    <div className="flex flex-col gap-4" aria-busy="true">
      <div className="h-8 w-40 animate-pulse rounded bg-stone-200" />
      <div className="h-5 w-full max-w-2xl animate-pulse rounded bg-stone-200" />
      <div className="h-64 animate-pulse rounded-xl bg-stone-200" />
    </div>
  );
}
