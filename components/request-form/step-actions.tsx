import { Button } from "@/components/ui/button";

export function StepActions({ onBack, nextLabel = "Next" }: { onBack?: () => void; nextLabel?: string }) {
  return (
    <div className="sticky bottom-0 -mx-4 mt-2 flex gap-3 border-t border-stone-200 bg-stone-50/95 px-4 py-3">
      {onBack ? (
        <Button variant="secondary" className="min-h-12 flex-1" onClick={onBack}>
          Back
        </Button>
      ) : null}
      <Button type="submit" className="min-h-12 flex-[2]">
        {nextLabel}
      </Button>
    </div>
  );
}
