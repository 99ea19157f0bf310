export default function RecipesLoading() {
  return (
    <div className="space-y-4" aria-busy="true" aria-label="Loading recipes">
      <div className="h-8 w-64 animate-pulse rounded bg-sand-light" />
      <div className="grid gap-6 lg:grid-cols-[1fr_22rem]">
        <div className="h-96 animate-pulse rounded-card bg-sand-light" />
        <div className="h-96 animate-pulse rounded-card bg-sand-light" />
      </div>
    </div>
  );
}
