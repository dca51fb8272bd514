export default function Loading() {
  return (
    <div className="flex max-w-md animate-pulse flex-col gap-4" role="status" aria-busy="true" aria-label="Loading">
      <div className="h-8 w-72 rounded bg-stone-200" />
      <div className="h-11 rounded bg-stone-200" />
      <div className="h-11 rounded bg-stone-200" />
      <div className="h-11 w-40 rounded bg-stone-200" />
    </div>
  );
}
