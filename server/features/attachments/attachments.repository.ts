/** Attachment records (Knex only); the bytes live on disk under UPLOAD_DIR with random names. */
import type { Knex } from 'knex';
import type { AttachmentDto } from '../../../shared/schemas/api';
import { nowIso, toIso } from '../../db/knex';

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
}

function select(db: Knex) {
  return db('attachments as a')
    .join('users as u', 'u.id', 'a.uploader_id')
    .select('a.*', 'u.display_name as uploader_name');
}

function toDto(r: AttachmentRow & { uploader_name: string }): AttachmentDto {
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
  };
}

export async function listAttachments(db: Knex, cantileverId: number): Promise<AttachmentDto[]> {
  const rows = (await select(db)
    .where('a.cantilever_id', cantileverId)
    .orderBy('a.id', 'desc')) as (AttachmentRow & { uploader_name: string })[];
  return rows.map(toDto);
}

export async function getAttachmentDto(db: Knex, id: number): Promise<AttachmentDto | undefined> {
  const row = (await select(db).where('a.id', id).first()) as
    (AttachmentRow & { uploader_name: string }) | undefined;
  return row ? toDto(row) : undefined;
}

export async function findAttachment(db: Knex, id: number): Promise<AttachmentRow | undefined> {
  return db<AttachmentRow>('attachments').where({ id }).first();
}

export async function insertAttachment(
  db: Knex,
  a: Omit<AttachmentRow, 'id' | 'created_at'>,
): Promise<number> {
  const [row] = await db('attachments')
    .insert({ ...a, created_at: nowIso() })
    .returning('id');
  return typeof row === 'object' ? (row as { id: number }).id : (row as number);
}
