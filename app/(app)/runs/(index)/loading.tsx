import { PageSkeleton } from "@/components/ui/page-skeleton";

// In a route group so the pages with an id (../[id]) are not under this
// loading boundary: once it has streamed, notFound() can no longer make the
// answer a 404, and another group's record must be one.

export default function Loading() {
  return <PageSkeleton title="w-64" blocks={["h-40", "h-40"]} label="Loading the pickup run page" />;
}
