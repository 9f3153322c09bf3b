import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiDelete, apiPatch } from '../../../lib/api-client';
import type { AttachmentDto, UpdateAttachmentBody } from '../../../../shared/schemas/api';
import { attachmentKeys } from './attachment-keys';

/** The uploader changes a file's description or the revision it belongs to. */
export function updateAttachment(attachmentId: number, body: UpdateAttachmentBody): Promise<AttachmentDto> {
  return apiPatch<AttachmentDto>(`/api/attachments/${attachmentId}`, { ...body });
}

/** The uploader or an admin deletes a file (its stored bytes and its record). */
export function deleteAttachment(attachmentId: number): Promise<void> {
  return apiDelete<void>(`/api/attachments/${attachmentId}`);
}

export function useUpdateAttachment(cantileverId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body }: { id: number; body: UpdateAttachmentBody }) => updateAttachment(id, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: attachmentKeys.list(cantileverId) }),
  });
}

export function useDeleteAttachment(cantileverId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => deleteAttachment(id),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: attachmentKeys.list(cantileverId) }),
  });
}
