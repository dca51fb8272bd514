/** Loading skeleton for the shop's admin pages: a title, a toolbar and a table or form block. */
export function PageSkeleton({ blocks = 1 }: { blocks?: number }) {
  return (
    <div className="flex animate-pulse flex-col gap-5" role="status" aria-busy="true" aria-label="Loading">
      <div className="h-8 w-56 rounded bg-stone-200" />
      <div className="h-11 w-full max-w-xl rounded bg-stone-200" />
      {Array.from({ length: blocks }, (_, i) => (
        <div key={i} className="h-72 rounded-xl bg-stone-200" />
      ))}
    </div>
  );
}
