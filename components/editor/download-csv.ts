// Saves CSV text the browser already holds as a file: a Blob and a link clicked on the person's behalf.
// No request leaves the browser. A byte-order mark lets spreadsheets read the UTF-8 text (µ, −, Ø) as such.

const BYTE_ORDER_MARK = '\uFEFF';

export function downloadCsv(fileName: string, text: string): void {
  const url = URL.createObjectURL(new Blob([BYTE_ORDER_MARK, text], { type: 'text/csv;charset=utf-8' }));
  const link = window.document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.click();
  // revoked after the click has been handled, so the download has its bytes
  window.setTimeout(() => URL.revokeObjectURL(url), 0);
}
