// Renders a schedule to PDF bytes on the server.
import { createElement } from 'react';
import { renderToBuffer } from '@react-pdf/renderer';
import type { ScheduleContent } from './content';
import { registerScheduleFonts } from './pdf/fonts';
import { ScheduleDocument } from './pdf/schedule-document';

export async function renderSchedulePdf(content: ScheduleContent, createdAt: Date): Promise<Buffer> {
  registerScheduleFonts();
  // renderToBuffer wants a <Document> element; ScheduleDocument returns one.
  const element = createElement(ScheduleDocument, { content, createdAt }) as unknown as Parameters<typeof renderToBuffer>[0];
  return renderToBuffer(element);
}
