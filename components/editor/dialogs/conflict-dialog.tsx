'use client';

// Someone else saved the plan after it was opened here. Nothing is lost until a choice is made.
export function ConflictDialog({ message, onReload, onOverwrite }: { message: string; onReload: () => void; onOverwrite: () => void }) {
  return (
    <div role="alertdialog" aria-modal="true" aria-labelledby="conflict-title" aria-describedby="conflict-text" className="panel absolute left-1/2 top-6 z-40 w-[26rem] -translate-x-1/2 border-l-4 border-risk p-4">
      <h2 id="conflict-title" className="text-sm font-semibold">This plan changed elsewhere</h2>
      <p id="conflict-text" className="mt-1 text-sm text-graphite-700">{message}</p>
      <div className="mt-3 flex gap-2">
        <button type="button" className="btn-quiet" onClick={onReload}>Reload their version</button>
        <button type="button" className="btn-risk" onClick={onOverwrite}>Overwrite with mine</button>
      </div>
    </div>
  );
}
