export default function Loading() {
  return (
    <div className="flex animate-pulse flex-col gap-4" role="status" aria-busy="true" aria-label="Loading">
      <div className="h-8 w-64 rounded bg-stone-200" />
      <div className="h-5 w-full rounded bg-stone-200" />
      <div className="grid grid-cols-5 gap-1">
        {Array.from({ length: 5 }, (_, i) => (
          <div key={i} className="h-12 rounded-lg bg-stone-200" />
        ))}
      </div>
      {Array.from({ length: 4 }, (_, i) => (
        <div key={i} className="h-16 rounded-lg bg-stone-200" />
      ))}
    </div>
  );
}
