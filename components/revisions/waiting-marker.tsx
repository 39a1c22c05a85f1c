// "Waiting for review" on a project or plan row: a mark and words, never colour alone.
export function WaitingMarker({ text }: { text: string }) {
  return (
    <span data-testid="waiting-marker" className="inline-flex items-center gap-1 whitespace-nowrap rounded border border-select bg-select-soft px-2 py-0.5 text-xs font-medium text-select-ink">
      <span aria-hidden="true">◷</span>
      {text}
    </span>
  );
}
