/** An example call as a shell command, to copy. */
export function ExampleCall({ label, command }: { label: string; command: string }) {
  return (
    <figure className="space-y-1">
      <figcaption className="text-xs font-medium uppercase tracking-wide text-graphite-500">{label}</figcaption>
      <pre className="overflow-x-auto rounded bg-paper-sunk p-3 font-mono text-xs leading-relaxed text-graphite">{command}</pre>
    </figure>
  );
}
