import { accessWords } from '@/lib/api-description/access-words';
import type { OperationView } from '@/lib/api-description/reference-view';
import { ExampleCall } from './example-call';
import { FieldTable } from './field-table';

/** One path and method of the API: what it does, who may call it, what it takes, what it answers, an example. */
export function OperationEntry({ view }: { view: OperationView }) {
  const { operation } = view;
  const body = operation.body;
  return (
    <article id={view.anchor} className="space-y-3 border-t border-graphite-100 px-4 py-4" data-testid="api-operation" aria-labelledby={`${view.anchor}-title`}>
      <header className="space-y-1">
        <h3 id={`${view.anchor}-title`} className="flex flex-wrap items-baseline gap-2">
          <span className="rounded border border-graphite-300 px-1.5 py-0.5 font-mono text-xs font-semibold">{operation.method}</span>
          <code className="break-all font-mono text-sm">{operation.path}</code>
          <span className="text-sm font-semibold">{operation.summary}</span>
        </h3>
        <p className="text-xs text-graphite-500">Who may call it: {accessWords(operation)}{operation.rateLimited ? '. Counts against your analyses per minute' : ''}{body.kind !== 'none' && operation.maxBodyBytes ? `. Body at most ${Math.round(operation.maxBodyBytes / 1024).toLocaleString('en')} KB` : ''}.</p>
      </header>
      {operation.description && <p className="text-sm text-graphite-700">{operation.description}</p>}
      <FieldTable caption="Parameters" rows={view.parameters} />
      {body.kind === 'json' && <FieldTable caption="Body (JSON)" rows={view.bodyFields} />}
      {body.kind === 'form' && <p className="text-sm"><span className="font-medium">Body:</span> {body.description}</p>}
      {body.kind === 'text' && <p className="text-sm"><span className="font-medium">Body:</span> {body.description} Header <code className="font-mono text-xs">{body.header.name}</code>: {body.header.description}</p>}
      <dl className="grid grid-cols-[4rem_1fr] gap-x-2 gap-y-1 text-sm">
        {view.answers.map((answer) => (
          <div key={answer.status} className="contents">
            <dt className="num font-mono text-xs">{answer.status}</dt>
            <dd className="text-xs text-graphite-700">
              {answer.description}
              {answer.fields.length > 0 && (
                <ul className="mt-1 space-y-0.5">
                  {answer.fields.map(([name, meaning]) => <li key={name}><code className="font-mono">{name}</code>: {meaning}</li>)}
                </ul>
              )}
            </dd>
          </div>
        ))}
      </dl>
      <ExampleCall label="Example call" command={view.curl} />
    </article>
  );
}
