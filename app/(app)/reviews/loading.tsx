export default function LoadingReviews() {
  return (
    <div className="space-y-6" aria-busy="true" aria-label="Loading the reviews waiting">
      <div className="h-7 w-40 animate-pulse rounded bg-paper-sunk" />
      <div className="panel divide-y divide-graphite-100">
        {[0, 1].map((row) => (
          <div key={row} className="px-4 py-4"><div className="h-4 w-72 animate-pulse rounded bg-paper-sunk" /></div>
        ))}
      </div>
    </div>
  );
}
