import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { browser } from '../../../lib/browser';

/** The name to save under when the server suggests none. */
export const MY_DATA_FILE_NAME = 'nappe-my-data.json';

/**
 * Everything Nappe holds about the signed-in client (`GET /api/me/export`, GDPR Art. 15 and 20),
 * fetched with the session's token — a plain link cannot carry it — and offered as a file.
 */
export async function downloadMyData(): Promise<void> {
  const file = await api.download('/me/export');
  browser.save(file, MY_DATA_FILE_NAME);
}

export const useDownloadMyData = () => useMutation({ mutationFn: downloadMyData });
