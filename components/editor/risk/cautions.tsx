// The usual cautions beside treatment advice: predictions, not a substitute for local codes or licensed practice.
export function TreatmentCautions() {
  return (
    <aside aria-label="Cautions" className="rounded border border-graphite-100 bg-paper-sunk px-3 py-2 text-xs text-graphite-700">
      <p className="font-medium">Before building any treatment</p>
      <ul className="mt-1 list-disc space-y-0.5 pl-4">
        <li>Duct lining and side branches must meet the fire and smoke ratings your local code requires; check the product&apos;s certificates.</li>
        <li>Added lengths, branches and silencers add weight: structural fixings and supports are for a qualified engineer to confirm.</li>
        <li>The levels here are predictions for comfort criteria. Occupational noise exposure is governed by local regulations; defer to them and to licensed practice.</li>
      </ul>
    </aside>
  );
}
