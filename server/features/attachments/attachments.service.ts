/** Storing and reading attachments: members only; design roles upload. */
import { createHash, randomUUID } from 'node:crypto';
import { mkdir, unlink, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { EDIT_RIGHTS, type AttachmentDto } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { badRequest, forbidden, notFound } from '../../lib/http-error';
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
  await mkdir(ctx.config.uploadDir, { recursive: true });
  const storedName = randomUUID();
  const path = join(ctx.config.uploadDir, storedName);
  await writeFile(path, file.buffer, { flag: 'wx', mode: 0o600 });
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
    await unlink(path).catch(() => undefined);
    throw err;
  }
}

export async function attachmentForMember(
  ctx: AppContext,
  user: Express.User,
  attachmentId: number,
): Promise<{ row: AttachmentRow; path: string }> {
  const row = await findAttachment(ctx.db, attachmentId);
  if (!row) throw notFound('attachment');
  try {
    await cantileverForMember(ctx.db, row.cantilever_id, user.id);
  } catch {
    throw notFound('attachment');
  }
  return { row, path: join(ctx.config.uploadDir, row.stored_name) };
}
