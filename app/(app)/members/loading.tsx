// Leaf segments only: a loading boundary above a page that can answer notFound() would turn its
// 404 status into a streamed 200.
import { PageSkeleton } from "@/components/ui/page-skeleton";

export default PageSkeleton;
