export default function Loading() {
  return (
    <div className="flex animate-pulse flex-col gap-6" role="status" aria-busy="true" aria-label="Loading the request">
      <div className="h-6 w-40 rounded bg-stone-200" />
      <div className="h-32 rounded-xl bg-stone-200" />
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
        <div className="h-[32rem] rounded-xl bg-stone-200" />
        <div className="h-[32rem] rounded-xl bg-stone-200" />
      </div>
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
        <div className="h-64 rounded-xl bg-stone-200" />
        <div className="h-64 rounded-xl bg-stone-200" />
      </div>
    </div>
  );
}
