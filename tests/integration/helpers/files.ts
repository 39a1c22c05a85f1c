// Small real files for upload tests, built in memory.
import { deflateSync } from 'node:zlib';

function crc32(bytes: Uint8Array): number {
  let crc = 0xffffffff;
  for (const byte of bytes) {
    crc ^= byte;
    for (let bit = 0; bit < 8; bit += 1) crc = (crc >>> 1) ^ (0xedb88320 & -(crc & 1));
  }
  return (crc ^ 0xffffffff) >>> 0;
}

function chunk(type: string, data: Uint8Array): Buffer {
  const typeAndData = Buffer.concat([Buffer.from(type, 'ascii'), Buffer.from(data)]);
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(typeAndData));
  return Buffer.concat([length, typeAndData, crc]);
}

const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

function greyHeader(widthPx: number, heightPx: number): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(widthPx, 0);
  header.writeUInt32BE(heightPx, 4);
  header[8] = 8; // bit depth
  header[9] = 0; // greyscale
  return chunk('IHDR', header);
}

// A grey PNG of the given size (PNG specification, ISO/IEC 15948: signature, IHDR, IDAT, IEND).
export function tinyPng(widthPx = 4, heightPx = 3): Uint8Array {
  const rows = Buffer.alloc((widthPx + 1) * heightPx, 0x80);
  for (let row = 0; row < heightPx; row += 1) rows[row * (widthPx + 1)] = 0; // filter type none
  return new Uint8Array(Buffer.concat([PNG_SIGNATURE, greyHeader(widthPx, heightPx), chunk('IDAT', deflateSync(rows)), chunk('IEND', new Uint8Array(0))]));
}

/**
 * A PNG that declares a grey image of the given size but carries the data of its first row only (PNG
 * specification, ISO/IEC 15948: a valid signature, IHDR and IEND): a few hundred bytes whatever size it
 * declares. `rows: 0` leaves out the image data altogether (a header-only file).
 */
export function declaredPng(widthPx: number, heightPx: number, rows: 0 | 1 = 1): Uint8Array {
  const firstRow = Buffer.alloc(widthPx + 1, 0x80);
  firstRow[0] = 0; // filter type none
  const data = rows === 0 ? [] : [chunk('IDAT', deflateSync(firstRow))];
  return new Uint8Array(Buffer.concat([PNG_SIGNATURE, greyHeader(widthPx, heightPx), ...data, chunk('IEND', new Uint8Array(0))]));
}

// A one-page PDF with a line of text, its page widthPt × heightPt points (PDF 1.4 structure written by hand).
export function tinyPdf(widthPt = 300, heightPt = 200): Uint8Array {
  const objects = [
    '<< /Type /Catalog /Pages 2 0 R >>',
    '<< /Type /Pages /Kids [3 0 R] /Count 1 >>',
    `<< /Type /Page /Parent 2 0 R /MediaBox [0 0 ${widthPt} ${heightPt}] /Contents 4 0 R /Resources << /Font << /F1 5 0 R >> >> >>`,
    '',
    '<< /Type /Font /Subtype /Type1 /BaseFont /Helvetica >>',
  ];
  const stream = 'BT /F1 18 Tf 40 100 Td (Level 2 plan) Tj ET';
  objects[3] = `<< /Length ${stream.length} >>\nstream\n${stream}\nendstream`;
  let body = '%PDF-1.4\n';
  const offsets: number[] = [];
  objects.forEach((object, index) => { offsets.push(body.length); body += `${index + 1} 0 obj\n${object}\nendobj\n`; });
  const xref = body.length;
  body += `xref\n0 ${objects.length + 1}\n0000000000 65535 f \n${offsets.map((offset) => `${String(offset).padStart(10, '0')} 00000 n \n`).join('')}`;
  body += `trailer\n<< /Size ${objects.length + 1} /Root 1 0 R >>\nstartxref\n${xref}\n%%EOF\n`;
  return new Uint8Array(Buffer.from(body, 'latin1'));
}
