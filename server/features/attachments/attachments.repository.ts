/** Attachment records (Knex only); the bytes live in the storage (local folder or S3) under random names. */
import type { Knex } from 'knex';
import type { AttachmentDto } from '../../../shared/schemas/api';
import { nowIso, toIso, insertReturningId } from '../../db/knex';

export interface AttachmentRow {
  id: number;
  cantilever_id: number;
  original_name: string;
  stored_name: string;
  mime_type: string;
  size: number;
  sha256: string;
  uploader_id: number;
  created_at: string;
  description: string;
  revision_id: number | null;
}

type Db = Knex | Knex.Transaction;
type ListedRow = AttachmentRow & { uploader_name: string; revision_number: number | null };

function select(db: Db) {
  return db('attachments as a')
    .join('users as u', 'u.id', 'a.uploader_id')
    .leftJoin('revisions as r', 'r.id', 'a.revision_id')
    .select('a.*', 'u.display_name as uploader_name', 'r.number as revision_number');
}

function toDto(r: ListedRow): AttachmentDto {
  return {
    id: r.id,
    cantileverId: r.cantilever_id,
    originalName: r.original_name,
    mimeType: r.mime_type,
    size: Number(r.size),
    sha256: r.sha256,
    uploaderId: r.uploader_id,
    uploaderName: r.uploader_name,
    createdAt: toIso(r.created_at),
    description: r.description ?? '',
    revisionId: r.revision_id ?? null,
    revisionNumber:
      r.revision_number === null || r.revision_number === undefined ? null : Number(r.revision_number),
  };
}

export async function listAttachments(db: Knex, cantileverId: number): Promise<AttachmentDto[]> {
  const rows = (await select(db)
    .where('a.cantilever_id', cantileverId)
    .orderBy('a.id', 'desc')) as ListedRow[];
  return rows.map(toDto);
}

export async function getAttachmentDto(db: Db, id: number): Promise<AttachmentDto | undefined> {
  const row = (await select(db).where('a.id', id).first()) as ListedRow | undefined;
  return row ? toDto(row) : undefined;
}

export async function findAttachment(db: Db, id: number): Promise<AttachmentRow | undefined> {
  return db<AttachmentRow>('attachments').where({ id }).first();
}

export async function insertAttachment(
  db: Knex,
  a: Omit<AttachmentRow, 'id' | 'created_at'>,
): Promise<number> {
  return insertReturningId(db, 'attachments', { ...a, created_at: nowIso() });
}

export async function updateAttachment(
  db: Db,
  id: number,
  patch: Partial<Pick<AttachmentRow, 'description' | 'revision_id'>>,
): Promise<void> {
  if (Object.keys(patch).length === 0) return;
  await db('attachments').where({ id }).update(patch);
}

/** Deletes the row; true when there was one. */
export async function deleteAttachmentRow(db: Db, id: number): Promise<boolean> {
  return (await db('attachments').where({ id }).delete()) > 0;
}

/** The cantilever a revision belongs to, or undefined when there is no such revision. */
export async function cantileverOfRevision(db: Db, revisionId: number): Promise<number | undefined> {
  const row = await db('revisions')
    .where({ id: revisionId })
    .first<{ cantilever_id: number } | undefined>('cantilever_id');
  return row?.cantilever_id;
}
