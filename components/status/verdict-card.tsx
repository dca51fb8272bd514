// One end's verdict from the engine, in words, with its colour always beside the text.
import type { SagVerdict } from "@/lib/sizing";

const LOOK: Record<SagVerdict["verdict"], { text: string; cls: string }> = {
  right: { text: "Spring is right", cls: "border-emerald-400 bg-emerald-50" },
  "too-soft": { text: "Spring is too soft", cls: "border-amber-500 bg-amber-soft" },
  "too-stiff": { text: "Spring is too stiff", cls: "border-amber-500 bg-amber-soft" },
  recheck: { text: "Measure again", cls: "border-sky-500 bg-sky-50" },
};

export function VerdictCard({ verdict }: { verdict: SagVerdict }) {
  const look = LOOK[verdict.verdict];
  return (
    <div className={`rounded-lg border-2 p-3 ${look.cls}`}>
      <p className="font-semibold">
        {verdict.end === "front" ? "Fork" : "Shock"}: {look.text}
      </p>
      <p className="mt-1 text-stone-800">{verdict.message}</p>
    </div>
  );
}
