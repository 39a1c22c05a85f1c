'use client';

import type { PlanRun, Termination } from '@/lib/plan';
import { NumberInput } from './number-input';

const CHOICES: { key: string; label: string; make: (previous: Termination) => Termination }[] = [
  { key: 'closed', label: 'Closed (rigid)', make: () => ({ kind: 'closed' }) },
  { key: 'open-flanged', label: 'Open — flanged', make: () => ({ kind: 'open', flange: 'flanged' }) },
  { key: 'open-unflanged', label: 'Open — unflanged', make: () => ({ kind: 'open', flange: 'unflanged' }) },
  { key: 'lined', label: 'Lined', make: (previous) => ({ kind: 'lined', absorption: previous.kind === 'lined' ? previous.absorption : 0.7 }) },
  { key: 'anechoic', label: 'Anechoic', make: () => ({ kind: 'anechoic' }) },
];

function keyOf(termination: Termination): string {
  return termination.kind === 'open' ? `open-${termination.flange}` : termination.kind;
}

interface EndPanelProps {
  run: PlanRun;
  nodeId: string;
  /** Its stable label, e.g. "A4 end". */
  label: string;
  termination: Termination;
  isChosenEnd: boolean;
  editable: boolean;
  onTermination: (termination: Termination) => void;
  onChooseEnd: () => void;
}

// An end of the run: its termination, and whether it is the end the results follow.
export function EndPanel({ run, nodeId, label, termination, isChosenEnd, editable, onTermination, onChooseEnd }: EndPanelProps) {
  const isStart = run.startNodeId === nodeId;
  return (
    <fieldset disabled={!editable} className="space-y-3">
      <legend className="mb-2 text-sm font-semibold">{isStart ? 'Start end (fan side)' : 'Duct end'} <span className="num" data-testid="end-label">{label}</span> · {run.name}</legend>
      <div>
        <label htmlFor="termination" className="block text-xs font-medium text-graphite-700">Termination</label>
        <select id="termination" className="field-input mt-0.5 py-1" value={keyOf(termination)} onChange={(event) => onTermination(CHOICES.find((choice) => choice.key === event.target.value)!.make(termination))}>
          {CHOICES.map((choice) => <option key={choice.key} value={choice.key}>{choice.label}</option>)}
        </select>
      </div>
      {termination.kind === 'lined' && (
        <NumberInput label="Absorption α of the lined end" value={termination.absorption} min={0} max={1} onCommit={(value) => value !== null && onTermination({ kind: 'lined', absorption: value })} />
      )}
      {!isStart && (
        isChosenEnd
          ? <p className="text-sm text-graphite-700"><span aria-hidden="true">◆ </span>The results follow the path to this end.</p>
          : <button type="button" className="btn-quiet" onClick={onChooseEnd}>Follow this end in the results</button>
      )}
    </fieldset>
  );
}
