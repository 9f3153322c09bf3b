/**
 * Storing, reading, describing and deleting attachments: members only; design roles upload; the
 * uploader describes a file and ties it to a revision of the same cantilever; the uploader or an
 * admin deletes it (the stored bytes and the row, with an audit row).
 */
import { createHash, randomUUID } from 'node:crypto';
import type { Knex } from 'knex';
import {
  EDIT_RIGHTS,
  attachmentFieldsSchema,
  type AttachmentDto,
  type UpdateAttachmentRequest,
} from '../../../shared/schemas/api';
import { toFieldIssues } from '../../../shared/schemas/quantity';
import type { AppContext } from '../../context';
import { HttpError, badRequest, forbidden, notFound } from '../../lib/http-error';
import { ChecksumError, MissingObjectError } from '../../storage/storage';
import { recordAudit } from '../audit/audit.repository';
import { cantileverForMember } from '../projects/project-access';
import {
  cantileverOfRevision,
  deleteAttachmentRow,
  findAttachment,
  getAttachmentDto,
  insertAttachment,
  listAttachments,
  updateAttachment,
  type AttachmentRow,
} from './attachments.repository';
import { ACCEPTED_TYPES_TEXT, sniffAttachment } from './sniff';

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

const MAX_NAME = 255;
// Bidirectional overrides and isolates (they can make "gnp.exe" read as "exe.png"), zero-width
// characters and the byte-order mark.
const INVISIBLE = /[\u200B-\u200F\u202A-\u202E\u2060-\u2069\uFEFF]/g;
// Control characters, path separators and the characters other systems refuse in file names.
// eslint-disable-next-line no-control-regex
const UNSAFE = /[\u0000-\u001F\u007F<>:"|?*\\/]/g;

/**
 * The name a file is kept and shown under: the last path part of what the browser sent, without
 * invisible or unsafe characters, runs of spaces, leading dots or trailing dots and spaces, at most
 * 255 characters with the extension kept; 'file.<ext>' when nothing is left.
 */
export function cleanFileName(raw: string): string {
  const last = raw.split(/[\\/]/).pop() ?? '';
  const cleaned = last
    .normalize('NFC')
    .replace(INVISIBLE, '')
    .replace(UNSAFE, '_')
    .replace(/\s+/g, ' ')
    .replace(/[\s.]+$/, '')
    .trim();
  const dot = cleaned.lastIndexOf('.');
  const tail = dot >= 0 ? `.${cleaned.slice(dot + 1, dot + 17).trim()}` : '';
  const base = (dot >= 0 ? cleaned.slice(0, dot) : cleaned).replace(/^[\s.]+/, '').trimEnd();
  if (!base) return `file${tail}`;
  return `${base.slice(0, MAX_NAME - tail.length).trimEnd()}${tail}`;
}

type Db = Knex | Knex.Transaction;

/** 400 naming `revisionId` unless the revision is one of this cantilever's. */
async function assertRevisionOf(db: Db, cantileverId: number, revisionId: number): Promise<void> {
  if ((await cantileverOfRevision(db, revisionId)) !== cantileverId)
    throw badRequest('The file can only be tied to a revision of the same cantilever.', [
      { path: 'revisionId', message: 'is not a revision of this cantilever' },
    ]);
}

export async function storeAttachment(
  ctx: AppContext,
  user: Express.User,
  cantileverId: number,
  file: { originalname: string; buffer: Buffer } | undefined,
  fields: unknown = {},
): Promise<AttachmentDto> {
  const parsed = attachmentFieldsSchema.safeParse(fields ?? {});
  if (!parsed.success) throw badRequest('The upload is not valid.', toFieldIssues(parsed.error));
  const description = parsed.data.description ?? '';
  const revisionId = parsed.data.revisionId === '' ? null : (parsed.data.revisionId ?? null);
  if (!file) throw badRequest('Choose a file to upload.', [{ path: 'file', message: 'is required' }]);
  if (revisionId !== null) await assertRevisionOf(ctx.db, cantileverId, revisionId);
  const originalName = cleanFileName(file.originalname);
  const sniff = await sniffAttachment(file.buffer, originalName);
  if (!sniff.ok)
    throw badRequest(`The file was refused: ${sniff.reason}. Accepted types: ${ACCEPTED_TYPES_TEXT}.`, [
      { path: 'file', message: sniff.reason },
    ]);
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
      description,
      revision_id: revisionId,
    });
    return (await getAttachmentDto(ctx.db, id))!;
  } catch (err) {
    await ctx.storage.delete(storedName).catch(() => undefined);
    throw err;
  }
}

/** The attachment's row for a member of its project; 404 to anyone else (existence is not revealed). */
async function rowForMember(db: Db, user: Express.User, attachmentId: number): Promise<AttachmentRow> {
  const row = await findAttachment(db, attachmentId);
  if (!row) throw notFound('attachment');
  try {
    await cantileverForMember(db, row.cantilever_id, user.id);
  } catch {
    throw notFound('attachment');
  }
  return row;
}

export async function attachmentForMember(
  ctx: AppContext,
  user: Express.User,
  attachmentId: number,
): Promise<{ row: AttachmentRow; bytes: Buffer }> {
  const row = await rowForMember(ctx.db, user, attachmentId);
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

/** The uploader changes the description or the revision the file belongs to. */
export async function editAttachment(
  ctx: AppContext,
  user: Express.User,
  attachmentId: number,
  body: UpdateAttachmentRequest,
): Promise<AttachmentDto> {
  const row = await rowForMember(ctx.db, user, attachmentId);
  if (row.uploader_id !== user.id)
    throw forbidden('Only the person who uploaded a file may change its description or revision.');
  if (body.revisionId != null) await assertRevisionOf(ctx.db, row.cantilever_id, body.revisionId);
  await updateAttachment(ctx.db, row.id, {
    ...(body.description !== undefined ? { description: body.description } : {}),
    ...(body.revisionId !== undefined ? { revision_id: body.revisionId } : {}),
  });
  return (await getAttachmentDto(ctx.db, row.id))!;
}

/**
 * The uploader or an admin deletes a file: the row and the audit row in one transaction, the stored
 * bytes before it commits (a store that refuses leaves both in place). A commit that fails after
 * the bytes are gone leaves a row whose download answers 404, never another file's bytes.
 */
export async function removeAttachment(
  ctx: AppContext,
  user: Express.User,
  attachmentId: number,
): Promise<void> {
  const row = await rowForMember(ctx.db, user, attachmentId);
  if (row.uploader_id !== user.id && user.role !== 'admin')
    throw forbidden('Only the person who uploaded a file or an admin may delete it.');
  await ctx.db.transaction(async (trx) => {
    if (!(await deleteAttachmentRow(trx, row.id))) throw notFound('attachment');
    await recordAudit(trx, {
      kind: 'attachment-deleted',
      userId: user.id,
      subject: row.original_name,
      detail: `attachment ${row.id} of cantilever ${row.cantilever_id}, sha256 ${row.sha256}`,
    });
    await ctx.storage.delete(row.stored_name);
  });
}
