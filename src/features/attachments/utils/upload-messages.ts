import { ApiError } from '../../../lib/api-client';

export const ACCEPTED = '.pdf,.png,.jpg,.jpeg,.dxf,.csv,application/pdf,image/png,image/jpeg,text/csv';
/** The server's default limit; the server decides, this only warns early. */
export const SIZE_HINT_BYTES = 10 * 1024 * 1024;
const EXTENSIONS = ['pdf', 'png', 'jpg', 'jpeg', 'dxf', 'csv'];

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} KiB`;
  return `${(bytes / 1024 / 1024).toFixed(1)} MiB`;
}

/** A warning before uploading, when the file looks too large or of a kind the server refuses. */
export function uploadHint(file: File): string | null {
  const ext = file.name.split('.').pop()?.toLowerCase() ?? '';
  if (!EXTENSIONS.includes(ext))
    return `“${file.name}” does not look like a PDF, PNG, JPEG, DXF or CSV file; the server will probably refuse it.`;
  if (file.size > SIZE_HINT_BYTES)
    return `“${file.name}” is ${formatBytes(file.size)}, more than the usual limit of ${formatBytes(SIZE_HINT_BYTES)}; the server will probably refuse it.`;
  return null;
}

/** The server's refusal in words. */
export function uploadErrorText(error: unknown): string {
  if (error instanceof ApiError) {
    if (error.status === 413) return `The file is too large. ${error.message}`;
    // The server's refusal already lists the accepted types once.
    if (error.status === 400) return `This file is not allowed. ${error.message}`;
    if (error.status === 403) return `You may not upload here. ${error.message}`;
    return error.message;
  }
  return error instanceof Error ? error.message : 'The upload failed.';
}
