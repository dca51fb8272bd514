import { StatusSkeleton } from "@/components/status/status-skeleton";

export default function Loading() {
  return <StatusSkeleton />;
}
