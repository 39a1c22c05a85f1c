export default function LoadingTeamSettings() {
  return (
    <div className="space-y-4" aria-busy="true" aria-label="Loading team settings">
      <div className="panel divide-y divide-graphite-100">
        {[0, 1, 2].map((row) => (
          <div key={row} className="px-4 py-4"><div className="h-4 w-72 animate-pulse rounded bg-paper-sunk" /></div>
        ))}
      </div>
    </div>
  );
}
