'use client';

export default function GlobalError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <html lang="en">
      <body style={{ fontFamily: 'sans-serif', background: '#f7f6f2', color: '#25282d', padding: '4rem 1rem', textAlign: 'center' }}>
        <h1>Antinode could not load this page</h1>
        <p>Nothing you saved was lost. {error.digest ? `Reference ${error.digest}.` : ''}</p>
        <button type="button" onClick={reset}>Try again</button>
      </body>
    </html>
  );
}
