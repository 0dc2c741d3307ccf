import { PageSkeleton } from "@/components/ui/page-skeleton";

export default function Loading() {
  return <PageSkeleton title="w-40" blocks={["h-64", "h-48"]} />;
}
