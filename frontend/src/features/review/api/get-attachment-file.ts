import { useEffect, useState } from 'react';
import { ApiError } from '@/lib/api-client';
import { authToken } from '@/lib/auth-token';

/**
 * `GET` an attachment's `url` (e.g. `/api/field-reports/:id/attachments/:attachmentId`) with the
 * bearer token. The files are served only to those allowed to see the report, so a plain
 * `<img src>` cannot load them.
 */
export async function getAttachmentFile(url: string, { signal }: { signal?: AbortSignal } = {}): Promise<Blob> {
  const headers = new Headers();
  const token = authToken.get();
  if (token) headers.set('Authorization', `Bearer ${token}`);
  const response = await fetch(url, { headers, signal });
  if (!response.ok) {
    throw new ApiError(response.status, {
      statusCode: response.status,
      error: response.statusText || 'Error',
      message: response.status === 404 ? 'The file is no longer there.' : 'The file could not be loaded.',
    });
  }
  return response.blob();
}

export type AttachmentFileState = { status: 'loading' } | { status: 'ready'; objectUrl: string } | { status: 'error'; message: string };

/** An object URL for the file while the component shows it; released afterwards. */
export function useAttachmentObjectUrl(url: string, enabled = true): AttachmentFileState {
  const [state, setState] = useState<AttachmentFileState>({ status: 'loading' });
  useEffect(() => {
    if (!enabled) return undefined;
    const controller = new AbortController();
    let objectUrl: string | null = null;
    setState({ status: 'loading' });
    getAttachmentFile(url, { signal: controller.signal })
      .then((blob) => {
        if (typeof URL.createObjectURL !== 'function') throw new Error('This browser cannot show the file.');
        objectUrl = URL.createObjectURL(blob);
        setState({ status: 'ready', objectUrl });
      })
      .catch((error: unknown) => {
        if (controller.signal.aborted) return;
        setState({ status: 'error', message: error instanceof Error ? error.message : 'The file could not be loaded.' });
      });
    return () => {
      controller.abort();
      if (objectUrl) URL.revokeObjectURL(objectUrl);
    };
  }, [url, enabled]);
  return state;
}
