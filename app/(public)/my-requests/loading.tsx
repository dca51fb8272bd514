export default function Loading() {
  return (
    <div className="flex animate-pulse flex-col gap-6" role="status" aria-busy="true" aria-label="Loading">
      <div className="h-8 w-48 rounded bg-stone-200" />
      <div className="h-5 w-64 rounded bg-stone-200" />
      {Array.from({ length: 3 }, (_, i) => (
        <div key={i} className="h-20 rounded-xl bg-stone-200" />
      ))}
    </div>
  );
}
