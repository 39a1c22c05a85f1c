// Registers IBM Plex (OFL, shipped in public/fonts) with the PDF renderer once per process, so
// every schedule embeds the same fonts as the app.
import path from 'node:path';
import { Font } from '@react-pdf/renderer';

export const SANS = 'Plex Sans';
export const MONO = 'Plex Mono';

let registered = false;

export function registerScheduleFonts(): void {
  if (registered) return;
  const dir = path.join(process.cwd(), 'public', 'fonts');
  Font.register({
    family: SANS,
    fonts: [
      { src: path.join(dir, 'ibm-plex-sans-latin-400-normal.woff'), fontWeight: 400 },
      { src: path.join(dir, 'ibm-plex-sans-latin-400-italic.woff'), fontWeight: 400, fontStyle: 'italic' },
      { src: path.join(dir, 'ibm-plex-sans-latin-500-normal.woff'), fontWeight: 500 },
      { src: path.join(dir, 'ibm-plex-sans-latin-600-normal.woff'), fontWeight: 600 },
    ],
  });
  Font.register({ family: MONO, fonts: [{ src: path.join(dir, 'ibm-plex-mono-latin-400-normal.woff'), fontWeight: 400 }] });
  // Words are never split with hyphens in the middle of a figure or a name.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}
