// The analyze route's work without the framework, for comparison (bench/load/analysis-answers.ts): a
// bare Node HTTP handler that reads the body, parses it, runs the engine on this thread, keeps the
// envelopes the query asks for, rounds the answer and serialises it, exactly as the route does
// (lib/analysis), with no session, rate limit, compute pool or Next.js around it.
import { createServer } from 'node:http';
import { analyzeRun, type RunInput } from '@/lib/acoustic';
import { analyzeEnvelopeRequest } from '@/lib/analysis/envelope-request';
import { roundedRunAnalysis } from '@/lib/analysis/round-answer';
import { assertRunSize } from '@/lib/analysis/run-limits';
import { withEnvelopesAsked } from '@/lib/analysis/select-envelopes';

const port = Number(process.argv[2] ?? 3201);

const server = createServer((request, response) => {
  const chunks: Buffer[] = [];
  request.on('data', (chunk: Buffer) => chunks.push(chunk));
  request.on('end', () => {
    try {
      const envelopes = analyzeEnvelopeRequest(`http://localhost${request.url ?? '/'}`);
      const input: unknown = JSON.parse(Buffer.concat(chunks).toString('utf8'));
      assertRunSize(input);
      const body = JSON.stringify(roundedRunAnalysis(withEnvelopesAsked(analyzeRun(input as RunInput), envelopes)));
      response.writeHead(200, { 'content-type': 'application/json' }).end(body);
    } catch (error) {
      response.writeHead(400, { 'content-type': 'application/json' }).end(JSON.stringify({ error: { message: String(error) } }));
    }
  });
});
server.listen(port, '127.0.0.1', () => console.log(`bare analyze handler listening on ${port}`));
