export default function CostingLoading() {
  return (
    <div className="space-y-4" aria-busy="true" aria-label="Loading costs">
      <div className="h-8 w-64 animate-pulse rounded bg-sand-light" />
      <div className="grid gap-4 md:grid-cols-3">
        <div className="h-40 animate-pulse rounded-card bg-sand-light" />
        <div className="h-40 animate-pulse rounded-card bg-sand-light" />
        <div className="h-40 animate-pulse rounded-card bg-sand-light" />
      </div>
      <div className="h-96 animate-pulse rounded-card bg-sand-light" />
    </div>
  );
}
