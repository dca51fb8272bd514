import type { RequestStatus } from "@/db/schema";
import { STATUS_BADGE_CLASSES, STATUS_LABELS } from "@/lib/requests/status";
import { cn } from "./cn";

export function StatusBadge({ status }: { status: RequestStatus }) {
  return (
    <span
      className={cn(
        "inline-flex items-center rounded-full px-2.5 py-0.5 text-sm font-medium ring-1",
        STATUS_BADGE_CLASSES[status],
      )}
    >
      {STATUS_LABELS[status]}
    </span>
  );
}
