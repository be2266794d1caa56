/**
 * A worker thread that renders job sheet PDFs (pdf-pool.ts starts it): laying out and compressing a PDF
 * takes hundreds of milliseconds of CPU, which must not hold up the server's request thread.
 */
import { parentPort } from 'node:worker_threads';
import { setDisplaySettings, type DisplaySettings } from '@/lib/presentation/format';
import type { JobSheetData } from './job-sheet-data';
import { renderJobSheetPdf } from './job-sheet-pdf';

export interface PdfJob {
  id: number;
  data: JobSheetData;
  display: DisplaySettings;
}
export type PdfReply = { id: number; pdf: Uint8Array } | { id: number; error: string };

const port = parentPort;
if (port) {
  port.on('message', async (job: PdfJob) => {
    try {
      setDisplaySettings(job.display);
      const buf = await renderJobSheetPdf(job.data);
      const pdf = new Uint8Array(buf.buffer, buf.byteOffset, buf.byteLength);
      port.postMessage({ id: job.id, pdf } satisfies PdfReply);
    } catch (err) {
      port.postMessage({ id: job.id, error: err instanceof Error ? err.message : String(err) } satisfies PdfReply);
    }
  });
}
