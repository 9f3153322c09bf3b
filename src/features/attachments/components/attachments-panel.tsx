import { EDIT_RIGHTS } from '../../../../shared/schemas/api';
import { useMe } from '../../../lib/api/me/get-me';
import { useAttachments } from '../api/get-attachments';
import { errorText } from '../../../lib/error-text';
import { AttachmentsList } from './attachments-list';
import { UploadControl } from './upload-control';

/**
 * The drawings and photos kept with one cantilever; design roles may add files, their uploader
 * describes them, the uploader or an admin deletes them.
 */
export function AttachmentsPanel({ cantileverId }: { cantileverId: number }) {
  const me = useMe();
  const attachments = useAttachments(cantileverId);
  const mayUpload = me.data ? EDIT_RIGHTS[me.data.role].attachments : false;
  return (
    <section aria-label="Attachments" className="space-y-3">
      {attachments.isPending && (
        <p role="status" className="text-sm text-concrete-600">
          Loading files…
        </p>
      )}
      {attachments.isError && (
        <p role="alert" className="text-sm text-util-over">
          Files could not be loaded: {errorText(attachments.error)}
        </p>
      )}
      {attachments.data && (
        <AttachmentsList
          attachments={attachments.data}
          cantileverId={cantileverId}
          me={me.data ?? undefined}
        />
      )}
      {mayUpload ? (
        <UploadControl cantileverId={cantileverId} />
      ) : (
        me.data && (
          <p className="text-xs text-concrete-600">
            Your role ({me.data.role}) may look at files but not add them.
          </p>
        )
      )}
    </section>
  );
}
