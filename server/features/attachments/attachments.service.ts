/** Storing and reading attachments: members only; design roles upload. */
import { createHash, randomUUID } from 'node:crypto';
import { EDIT_RIGHTS, type AttachmentDto } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { HttpError, badRequest, forbidden, notFound } from '../../lib/http-error';
import { ChecksumError, MissingObjectError } from '../../storage/storage';
import { cantileverForMember } from '../projects/project-access';
import {
  findAttachment,
  getAttachmentDto,
  insertAttachment,
  listAttachments,
  type AttachmentRow,
} from './attachments.repository';
import { sniffAttachment } from './sniff';

export async function attachmentsOf(
  ctx: AppContext,
  user: Express.User,
  cantileverId: number,
): Promise<AttachmentDto[]> {
  await cantileverForMember(ctx.db, cantileverId, user.id);
  return listAttachments(ctx.db, cantileverId);
}

/** Membership first (404), then the role (403): run before the upload body is read. */
export async function assertMayUpload(
  ctx: AppContext,
  user: Express.User,
  cantileverId: number,
): Promise<void> {
  await cantileverForMember(ctx.db, cantileverId, user.id);
  if (!EDIT_RIGHTS[user.role].attachments)
    throw forbidden(`Your role (${user.role}) may not upload attachments.`);
}

export async function storeAttachment(
  ctx: AppContext,
  user: Express.User,
  cantileverId: number,
  file: { originalname: string; buffer: Buffer } | undefined,
): Promise<AttachmentDto> {
  if (!file) throw badRequest('Choose a file to upload.', [{ path: 'file', message: 'is required' }]);
  const originalName = file.originalname.replace(/[\\/\0]/g, '_').slice(0, 255) || 'file';
  const sniff = await sniffAttachment(file.buffer, originalName);
  if (!sniff.ok)
    throw badRequest(`The file was refused: ${sniff.reason}.`, [{ path: 'file', message: sniff.reason }]);
  const storedName = randomUUID();
  await ctx.storage.put(storedName, file.buffer, sniff.mime);
  try {
    const id = await insertAttachment(ctx.db, {
      cantilever_id: cantileverId,
      original_name: originalName,
      stored_name: storedName,
      mime_type: sniff.mime,
      size: file.buffer.length,
      sha256: createHash('sha256').update(file.buffer).digest('hex'),
      uploader_id: user.id,
    });
    return (await getAttachmentDto(ctx.db, id))!;
  } catch (err) {
    await ctx.storage.delete(storedName).catch(() => undefined);
    throw err;
  }
}

export async function attachmentForMember(
  ctx: AppContext,
  user: Express.User,
  attachmentId: number,
): Promise<{ row: AttachmentRow; bytes: Buffer }> {
  const row = await findAttachment(ctx.db, attachmentId);
  if (!row) throw notFound('attachment');
  try {
    await cantileverForMember(ctx.db, row.cantilever_id, user.id);
  } catch {
    throw notFound('attachment');
  }
  try {
    return { row, bytes: await ctx.storage.get(row.stored_name, row.sha256) };
  } catch (err) {
    if (err instanceof MissingObjectError) throw notFound('attachment file');
    if (err instanceof ChecksumError)
      throw new HttpError(
        500,
        'checksum_mismatch',
        'The stored file does not match its checksum; it is not served.',
      );
    throw err;
  }
}
