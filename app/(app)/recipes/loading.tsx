export default function RecipesLoading() {
  return (
    <div className="space-y-4" aria-busy="true" aria-label="Loading recipes">
      <div className="h-8 w-64 animate-pulse rounded bg-sand-light" />
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="h-96 animate-pulse rounded-card bg-sand-light" />
        <div className="h-96 animate-pulse rounded-card bg-sand-light" />
      </div>
    </div>
  );
}
