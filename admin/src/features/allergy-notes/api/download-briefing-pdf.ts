import { useMutation } from '@tanstack/react-query';
import { downloadFile } from '../../../lib/download';

/** The name the PDF is saved under when the server suggests none. */
const BRIEFING_PDF_FALLBACK_NAME = 'allergy-briefing.pdf';

/**
 * `GET /api/orders/:id/briefing.pdf` (chef, staff; logged by the API), through the admin's one
 * download path (`lib/download.ts`: the session's token, one refresh and retry on a 401, then an
 * in-memory copy offered to save and released once the browser has it). Generated on request,
 * never stored by the API. Resolves with the file name used.
 */
export const downloadBriefingPdf = (orderId: string): Promise<string> =>
  downloadFile(`/orders/${encodeURIComponent(orderId)}/briefing.pdf`, BRIEFING_PDF_FALLBACK_NAME);

export const useDownloadBriefingPdf = () => useMutation({ mutationFn: downloadBriefingPdf });
