export default function Loading() {
  return (
    <div className="space-y-4" aria-busy="true" aria-label="Loading">
      <div className="h-5 w-64 rounded bg-paper-sunk" />
      <div className="panel h-24" />
      <div className="panel h-64" />
    </div>
  );
}
