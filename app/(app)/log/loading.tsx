import { PageSkeleton } from "@/components/ui/page-skeleton";

export default function Loading() {
  return <PageSkeleton narrow title="w-48" blocks={["h-12", "h-72"]} />;
}
