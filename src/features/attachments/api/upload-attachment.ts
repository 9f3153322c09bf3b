import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ApiError, type FieldIssue } from '../../../lib/api-client';
import type { AttachmentDto } from '../../../../shared/schemas/api';
import { attachmentKeys } from './attachment-keys';

interface ErrorBody {
  error?: { code?: string; message?: string; issues?: FieldIssue[] };
}

function failure(status: number, text: string): ApiError {
  let body: ErrorBody | null;
  try {
    body = JSON.parse(text) as ErrorBody;
  } catch {
    body = null;
  }
  const err = body?.error;
  return new ApiError(
    status,
    err?.code ?? `http_${status}`,
    err?.message ?? `The server answered ${status}.`,
    err?.issues ?? [],
    body,
  );
}

/** What goes with the file: an optional description and the revision it belongs to (null: none). */
export interface UploadDetails {
  description: string;
  revisionId: number | null;
}

/**
 * Uploads one file as multipart field `file`, with `description` and `revisionId` beside it. fetch cannot report upload progress, so this is the one
 * request that uses XMLHttpRequest; errors come back as the same ApiError as everywhere else.
 */
export function uploadAttachment(
  cantileverId: number,
  file: File,
  onProgress: (fraction: number) => void,
  details: UploadDetails = { description: '', revisionId: null },
): Promise<AttachmentDto> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api/cantilevers/${cantileverId}/attachments`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) onProgress(event.loaded / event.total);
    };
    xhr.onload = () => {
      if (xhr.status >= 200 && xhr.status < 300) {
        onProgress(1);
        try {
          resolve(JSON.parse(xhr.responseText) as AttachmentDto);
        } catch {
          reject(
            new ApiError(
              xhr.status,
              'bad_response',
              'The server answered with something that is not an attachment.',
            ),
          );
        }
      } else reject(failure(xhr.status, xhr.responseText));
    };
    xhr.onerror = () =>
      reject(
        new ApiError(0, 'network', 'The server could not be reached. Check the connection and try again.'),
      );
    const form = new FormData();
    // The text parts first, so the server has them before the file's bytes.
    if (details.description.trim()) form.append('description', details.description.trim());
    if (details.revisionId !== null) form.append('revisionId', String(details.revisionId));
    form.append('file', file);
    xhr.send(form);
  });
}

export function useUploadAttachment(cantileverId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({
      file,
      onProgress,
      details,
    }: {
      file: File;
      onProgress: (fraction: number) => void;
      details?: UploadDetails;
    }) => uploadAttachment(cantileverId, file, onProgress, details),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: attachmentKeys.list(cantileverId) }),
  });
}
