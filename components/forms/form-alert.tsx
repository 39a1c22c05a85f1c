export function FormAlert({ message }: { message: string | null }) {
  if (!message) return null;
  return (
    <div role="alert" data-testid="form-alert" className="rounded border border-risk bg-risk-soft px-3 py-2 text-sm text-risk-ink">
      <span className="font-semibold">Not done: </span>
      {message}
    </div>
  );
}
