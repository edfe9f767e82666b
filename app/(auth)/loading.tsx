// Inside this group's layout, so the layout's access check decides the status (403, redirect) before anything streams.
export { LoadingSkeleton as default } from "@/components/loading-skeleton";
