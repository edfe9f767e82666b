/** The skeleton every loading.tsx shows while a page reads its data. */
export function LoadingSkeleton() {
  return (
    <div aria-busy="true" aria-live="polite" className="space-y-3">
      <span className="sr-only">Loading…</span>
      <div className="h-8 w-1/2 animate-pulse rounded bg-loam-200" />
      <div className="h-24 animate-pulse rounded bg-loam-100" />
    </div>
  );
}
