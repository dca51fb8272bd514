export default function Loading() {
  return (
    <div className="flex animate-pulse flex-col gap-6" role="status" aria-busy="true" aria-label="Loading">
      <div className="h-8 w-56 rounded bg-stone-200" />
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-5">
        {Array.from({ length: 5 }, (_, i) => (
          <div key={i} className="h-20 rounded-xl bg-stone-200" />
        ))}
      </div>
      <div className="h-96 rounded-xl bg-stone-200" />
    </div>
  );
}
