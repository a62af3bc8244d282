import { ApiError, errorFromResponse } from '../../lib/api-client';

/** Sends one file as multipart field `file` (the JSON api client does not do multipart); errors become ApiError. */
export async function uploadFile<T>(path: string, file: File): Promise<T> {
  const form = new FormData();
  form.append('file', file, file.name);
  let response: Response;
  try {
    response = await fetch(path, { method: 'POST', body: form, credentials: 'same-origin', headers: { Accept: 'application/json' } });
  } catch {
    throw new ApiError(0, 'network', 'Could not reach the server. Check the connection and try again.');
  }
  if (!response.ok) throw await errorFromResponse(response);
  return (await response.json()) as T;
}
