export default function Loading() {
  return (
    <div className="space-y-4" aria-busy="true" aria-label="Loading">
      <div className="h-8 w-64 animate-pulse rounded bg-sand-light" />
      <div className="h-40 animate-pulse rounded-card bg-sand-light" />
    </div>
  );
}
