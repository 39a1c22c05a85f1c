// What kind of CAD file the bytes are, judged by their start (never the name).
// Sources: the DWG file's first six bytes are its version string, "AC1012" … "AC1032" for R13 onwards
// and "AC1001" … "AC1009" before (Open Design Alliance, "Open Design Specification for .dwg files",
// section 2, file header); a binary DXF starts with "AutoCAD Binary DXF" CR LF SUB NUL and an ASCII
// DXF is pairs of lines, a group code then its value, opening with 0 / SECTION after any 999
// comments (AutoCAD DXF Reference, "Binary DXF Files" and "DXF Format").

export type CadFileKind = 'dwg' | 'binary_dxf' | 'ascii_dxf';

const BINARY_DXF_SENTINEL = 'AutoCAD Binary DXF';
const LOOKED_AT_BYTES = 4096;

function startText(bytes: Uint8Array): string {
  return new TextDecoder('latin1').decode(bytes.subarray(0, LOOKED_AT_BYTES));
}

/** True when the text opens as an ASCII DXF does: group-code / value line pairs reaching 0 SECTION. */
function opensAsAsciiDxf(text: string): boolean {
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/);
  for (let index = 0; index + 1 < lines.length; index += 2) {
    const code = lines[index]!.trim();
    const value = lines[index + 1]!.trim();
    if (code === '999') continue;
    return code === '0' && value === 'SECTION';
  }
  return false;
}

export function cadFileKind(bytes: Uint8Array): CadFileKind | null {
  const text = startText(bytes);
  if (/^AC10\d\d/.test(text) || /^AC[12]\.\d/.test(text)) return 'dwg';
  if (text.startsWith(BINARY_DXF_SENTINEL)) return 'binary_dxf';
  return opensAsAsciiDxf(text) ? 'ascii_dxf' : null;
}

/** Whether a file's name says DXF (used only to word a refusal: the content decides). */
export function namedAsDxf(fileName: string): boolean {
  return /\.dxf$/i.test(fileName);
}
