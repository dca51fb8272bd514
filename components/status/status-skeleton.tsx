export function StatusSkeleton() {
  return (
    <div className="flex animate-pulse flex-col gap-6" role="status" aria-busy="true" aria-label="Loading">
      <div className="flex flex-col gap-2">
        <div className="h-8 w-48 rounded bg-stone-200" />
        <div className="h-5 w-64 rounded bg-stone-200" />
        <div className="h-6 w-40 rounded-full bg-stone-200" />
      </div>
      <div className="h-40 rounded-xl bg-stone-200" />
      <div className="h-64 rounded-xl bg-stone-200" />
    </div>
  );
}
