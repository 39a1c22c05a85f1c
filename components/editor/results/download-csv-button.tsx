'use client';

import { useState } from 'react';
import { downloadCsv } from '../download-csv';

interface DownloadCsvButtonProps {
  /** What the file holds, for the button's accessible name: "the resonances". */
  what: string;
  fileName: string;
  /** Builds the file's text when the button is pressed. */
  csv: () => string;
}

// "Download CSV" for one table of results; a file that cannot be built says why instead.
export function DownloadCsvButton({ what, fileName, csv }: DownloadCsvButtonProps) {
  const [problem, setProblem] = useState<string | null>(null);
  function download() {
    try {
      downloadCsv(fileName, csv());
      setProblem(null);
    } catch (error) {
      setProblem(`The CSV of ${what} could not be made: ${error instanceof Error ? error.message : String(error)}`);
    }
  }
  return (
    <span className="inline-flex flex-col items-start gap-1">
      <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={download} aria-label={`Download ${what} as CSV`} title={fileName}>Download CSV</button>
      {problem && <span role="alert" className="text-xs text-risk-ink">{problem}</span>}
    </span>
  );
}
