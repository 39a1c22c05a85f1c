import type { Metadata } from 'next';
import Link from 'next/link';
import { ExampleCall } from '@/components/api-reference/example-call';
import { OperationEntry } from '@/components/api-reference/operation-entry';
import { API_OPERATIONS, apiDocument, curlExample, type HttpMethod } from '@/lib/api-description';
import { QUARTER_WAVE_RUN, quarterWaveEstimateHz } from '@/lib/api-description/examples';
import { referenceByArea } from '@/lib/api-description/reference-view';
import { publicOrigin } from '@/lib/http/same-origin';

export const metadata: Metadata = { title: 'API reference' };

function operation(method: HttpMethod, path: string) {
  const found = API_OPERATIONS.find((one) => one.method === method && one.path === path);
  if (!found) throw new Error(`The API description has no ${method} ${path}.`);
  return found;
}

export default function ApiReferencePage() {
  const baseUrl = publicOrigin();
  const areas = referenceByArea(apiDocument(baseUrl), API_OPERATIONS, baseUrl);
  const run = QUARTER_WAVE_RUN.segments[0];
  return (
    <div className="mx-auto max-w-4xl space-y-6">
      <div>
        <p className="text-sm text-graphite-500"><Link href="/account" className="underline">Account</Link></p>
        <h1 className="text-xl font-semibold">API reference</h1>
      </div>

      <section className="panel space-y-3 p-6 text-sm" aria-labelledby="api-start-title">
        <h2 id="api-start-title" className="font-semibold">Calling the API</h2>
        <p>
          Scripts call the same routes the app uses, at <code className="font-mono text-xs">{baseUrl}/api/v1/…</code>. Make a token under{' '}
          <Link href="/account#tokens-title" className="underline">API tokens</Link> on your account page and send it as{' '}
          <code className="font-mono text-xs">Authorization: Bearer ant_…</code>: it acts as you, in one team, with the role you gave it. The examples read it
          from <code className="font-mono text-xs">$ANTINODE_TOKEN</code>.
        </p>
        <p>
          Bodies are JSON in SI units named in the field (<code className="font-mono text-xs">lengthM</code>, <code className="font-mono text-xs">frequencyHz</code>);
          a field the route does not know is refused. Every refusal has one shape,{' '}
          <code className="font-mono text-xs">{'{ "error": { "code", "message", "field"? } }'}</code>, and the message says what was wrong and where.
        </p>
        <p>
          The whole description, for tools that read OpenAPI 3.1:{' '}
          <a href="/api/v1/openapi.json" className="font-medium underline" data-testid="openapi-link">/api/v1/openapi.json</a>.
        </p>
      </section>

      <section className="panel space-y-4 p-6 text-sm" aria-labelledby="api-examples-title">
        <h2 id="api-examples-title" className="font-semibold">Example calls</h2>
        <div className="space-y-2" data-testid="analyse-example">
          <h3 className="font-medium">Analyse a run</h3>
          <p className="text-graphite-700">
            {run.lengthM} m of round duct, Ø {run.section.diameterM * 1000} mm, closed at the fan end and open (unflanged) at the far end, ideal walls,
            air at {QUARTER_WAVE_RUN.temperatureC} °C, with the pressure envelope of the first resonance. That first resonance is the quarter-wave one:
            expect about <span className="num">{quarterWaveEstimateHz().toFixed(1)} Hz</span>, c / 4(L + 0.6133 a) with the end correction of an
            unflanged pipe (Levine &amp; Schwinger, 1948).
          </p>
          <ExampleCall label="Analyse a run" command={curlExample(operation('POST', '/api/v1/analyze'), baseUrl)} />
        </div>
        <div className="space-y-2" data-testid="results-example">
          <h3 className="font-medium">Read a plan&apos;s results and noise path</h3>
          <p className="text-graphite-700">
            The results hold every run&apos;s analysis on the saved plan (here with the envelopes of two resonances of one run); the risks hold each
            room&apos;s noise path, from the fan&apos;s sound power through the ductwork to each listener, against the room&apos;s criterion
            (<code className="font-mono text-xs">rooms[].noise</code>). Both read the one stored analysis of the plan&apos;s version.
          </p>
          <ExampleCall label="Results" command={curlExample(operation('GET', '/api/v1/plans/{planId}/results'), baseUrl)} />
          <ExampleCall label="Risks, room results and noise path" command={curlExample(operation('GET', '/api/v1/plans/{planId}/risks'), baseUrl)} />
        </div>
      </section>

      <nav aria-label="Areas of the API" className="text-sm">
        <ul className="flex flex-wrap gap-x-4 gap-y-1">
          {areas.map(({ area, anchor, views }) => (
            <li key={area}><a href={`#${anchor}`} className="underline">{area}</a> <span className="num text-graphite-500">({views.length})</span></li>
          ))}
        </ul>
      </nav>

      {areas.map(({ area, anchor, views }) => (
        <section key={area} id={anchor} className="panel" aria-labelledby={`${anchor}-title`}>
          <h2 id={`${anchor}-title`} className="px-4 py-3 font-semibold">{area}</h2>
          {views.map((view) => <OperationEntry key={view.anchor} view={view} />)}
        </section>
      ))}
    </div>
  );
}
