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

/**
 * Uploads one file as multipart field `file`. fetch cannot report upload progress, so this is the one
 * request that uses XMLHttpRequest; errors come back as the same ApiError as everywhere else.
 */
export function uploadAttachment(
  cantileverId: number,
  file: File,
  onProgress: (fraction: number) => void,
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
    form.append('file', file);
    xhr.send(form);
  });
}

export function useUploadAttachment(cantileverId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, onProgress }: { file: File; onProgress: (fraction: number) => void }) =>
      uploadAttachment(cantileverId, file, onProgress),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: attachmentKeys.list(cantileverId) }),
  });
}
