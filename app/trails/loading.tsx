// Loading boundaries live per segment, not at the app root: a root one would stream every page before
// the (staff) and (admin) layouts decide their 403.
export { LoadingSkeleton as default } from "@/components/loading-skeleton";
