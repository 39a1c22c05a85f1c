'use client';

import type { SaveStatus } from './editor-model';

const LABELS: Record<SaveStatus, { text: string; mark: string; tone: string }> = {
  saved: { text: 'All changes saved', mark: '✓', tone: 'text-graphite-500' },
  unsaved: { text: 'Unsaved changes', mark: '•', tone: 'text-graphite-700' },
  saving: { text: 'Saving…', mark: '…', tone: 'text-graphite-700' },
  conflict: { text: 'Not saved: changed elsewhere', mark: '⚠', tone: 'text-risk-ink' },
  error: { text: 'Not saved', mark: '⚠', tone: 'text-risk-ink' },
};

export function SaveStatusLabel({ status, version }: { status: SaveStatus; version: number }) {
  const label = LABELS[status];
  return (
    <span role="status" data-testid="save-status" className={`num whitespace-nowrap text-xs ${label.tone}`} title={`Version ${version}`}>
      <span aria-hidden="true">{label.mark} </span>{status === 'saved' ? <><span className="xl:hidden">Saved</span><span className="hidden xl:inline">{label.text}</span></> : label.text}<span className="hidden 2xl:inline"> · version {version}</span>
    </span>
  );
}
