import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ShapeImportDto } from '../../../../shared/schemas/api';
import { ApiError } from '../../../lib/api-client';
import { shapeKeys } from '../../../lib/api/shapes/shape-keys';

/**
 * Uploads a CSV of shapes (multipart field "file"). XMLHttpRequest rather than fetch, for the upload
 * progress; errors become the same ApiError as every other request.
 */
export function importShapes(
  file: File,
  projectId: number | null,
  onProgress?: (fraction: number) => void,
): Promise<ShapeImportDto> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', '/api/shapes/import');
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && onProgress) onProgress(event.loaded / event.total);
    };
    xhr.onerror = () =>
      reject(
        new ApiError(0, 'network', 'The server could not be reached. Check the connection and try again.'),
      );
    xhr.onload = () => {
      let data: unknown = null;
      try {
        data = xhr.responseText ? JSON.parse(xhr.responseText) : null;
      } catch {
        data = xhr.responseText;
      }
      if (xhr.status >= 200 && xhr.status < 300) {
        resolve(data as ShapeImportDto);
        return;
      }
      const err = (
        data as {
          error?: { code?: string; message?: string; issues?: { path: string; message: string }[] };
        } | null
      )?.error;
      reject(
        new ApiError(
          xhr.status,
          err?.code ?? `http_${xhr.status}`,
          err?.message ?? `The server answered ${xhr.status}.`,
          err?.issues ?? [],
          data,
        ),
      );
    };
    const form = new FormData();
    // The text field goes first so the server knows the scope before the file arrives.
    if (projectId !== null) form.append('projectId', String(projectId));
    form.append('file', file);
    xhr.send(form);
  });
}

export function useImportShapes(onProgress: (fraction: number) => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, projectId }: { file: File; projectId: number | null }) =>
      importShapes(file, projectId, onProgress),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shapeKeys.all }),
  });
}
