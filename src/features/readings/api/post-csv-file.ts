import { apiClient } from '../../../lib/api-client';

/**
 * POST one CSV file in the multipart field `file`; resolves with the JSON body. With `onProgress`,
 * reports the share of the file sent (0–1) as it goes.
 */
export const postCsvFile = <T>(
  path: string,
  file: File,
  onProgress?: (sent: number) => void,
): Promise<T> =>
  onProgress
    ? apiClient.uploadWithProgress<T>(path, 'file', file, onProgress)
    : apiClient.upload<T>(path, 'file', file);
