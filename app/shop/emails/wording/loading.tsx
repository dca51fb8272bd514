import { PageSkeleton } from "@/components/settings/page-skeleton";

export default function Loading() {
  return <PageSkeleton blocks={2} />;
}
