export default function Loading() {
  return (
    <div className="flex animate-pulse flex-col gap-6" role="status" aria-busy="true" aria-label="Loading">
      <div className="h-8 w-40 rounded bg-stone-200" />
      <div className="h-5 w-2/3 rounded bg-stone-200" />
      {Array.from({ length: 3 }, (_, i) => (
        <div key={i} className="flex flex-col gap-3 rounded-xl border border-stone-200 p-4">
          <div className="h-6 w-64 rounded bg-stone-200" />
          <div className="h-4 w-96 max-w-full rounded bg-stone-200" />
          <div className="h-[28rem] rounded-lg bg-stone-200" />
        </div>
      ))}
    </div>
  );
}
