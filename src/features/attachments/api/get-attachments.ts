import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import type { AttachmentDto } from '../../../../shared/schemas/api';
import { attachmentKeys } from './attachment-keys';

export function getAttachments(cantileverId: number, signal?: AbortSignal): Promise<AttachmentDto[]> {
  return apiGet<AttachmentDto[]>(`/api/cantilevers/${cantileverId}/attachments`, signal);
}

export function attachmentsQueryOptions(cantileverId: number) {
  return queryOptions({
    queryKey: attachmentKeys.list(cantileverId),
    queryFn: ({ signal }) => getAttachments(cantileverId, signal),
  });
}

export function useAttachments(cantileverId: number) {
  return useQuery(attachmentsQueryOptions(cantileverId));
}

/** Where a file downloads from; `inline` asks the server to show a PDF or image in the browser. */
export function attachmentUrl(attachmentId: number, inline = false): string {
  return `/api/attachments/${attachmentId}${inline ? '?inline=1' : ''}`;
}
