import { apiClient } from '../../../lib/api-client';

/** POST one CSV file in the multipart field `file`; resolves with the JSON body. */
export const postCsvFile = <T>(path: string, file: File): Promise<T> =>
  apiClient.upload<T>(path, 'file', file);
