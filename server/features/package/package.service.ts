/**
 * The calculation package of a stored revision, for project members only (anyone else gets 404).
 * Built from the stored input and result documents, never from anything unsaved.
 */
import type { Knex } from 'knex';
import { plateScheduleRow } from '../../../shared/engine/connection/plate-schedule';
import { lookupWith } from '../../../shared/engine/shapes/table';
import type { DesignResult } from '../../../shared/engine/types';
import type { DesignInput } from '../../../shared/schemas/design';
import { parsedConnectionSchema } from '../../../shared/schemas/parsed-design';
import type { AppContext } from '../../context';
import { toIso } from '../../db/knex';
import { revisionForMember, type CantileverRow, type RevisionRow } from '../projects/project-access';
import { findProject } from '../projects/projects.repository';
import { storedSections } from '../revisions/evaluate';
import { listReviews } from '../revisions/revisions.repository';
import { findUserById } from '../users/users.repository';
import type { PackageData } from './package-data';
import { sha256 } from './package-from-file';
import { buildPackagePdf } from './package-pdf';
import { layoutFor } from './package-root';

export interface PdfFile {
  filename: string;
  pdf: Buffer;
}

function slug(text: string): string {
  return (
    text
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '')
      .slice(0, 60) || 'cantilever'
  );
}

export async function packageData(
  db: Knex,
  revision: RevisionRow,
  cantilever: CantileverRow & { quantity?: number | null },
): Promise<PackageData> {
  const project = await findProject(db, cantilever.project_id);
  const author = await findUserById(db, revision.author_id);
  const reviews = await listReviews(db, revision.id);
  const state = reviews.length ? reviews[reviews.length - 1].state : 'draft';
  const approval = state === 'approved' ? reviews[reviews.length - 1] : null;
  const count = (await db('revisions').where({ cantilever_id: cantilever.id }).count({ n: '*' }).first()) as
    { n: number | string } | undefined;
  const input = JSON.parse(revision.input_json) as DesignInput;
  const result = JSON.parse(revision.result_json) as DesignResult;
  const find = lookupWith(storedSections(revision.sections_json));
  return {
    projectName: project?.name ?? 'project',
    site: project?.site ?? '',
    codeBasis: project?.code_basis ?? '',
    cantileverName: cantilever.name,
    quantity: Number(cantilever.quantity ?? 1),
    revision: {
      number: revision.number,
      of: Number(count?.n ?? revision.number),
      message: revision.message,
      author: author?.display_name ?? `user ${revision.author_id}`,
      createdAt: toIso(revision.created_at),
      reviewState: state,
      approvedBy: approval?.reviewerName ?? null,
      approvedAt: approval?.createdAt ?? null,
    },
    engineVersion: revision.engine_version,
    inputSha256: sha256(revision.input_json),
    resultSha256: sha256(revision.result_json),
    input,
    result,
    layout: layoutFor(input, find),
    scheduleRow: input.connection
      ? plateScheduleRow(
          `${cantilever.name} (rev ${revision.number})`,
          parsedConnectionSchema.parse(input.connection),
          result.connection,
        )
      : null,
  };
}

export async function revisionPackage(
  ctx: AppContext,
  user: Express.User,
  revisionId: number,
): Promise<PdfFile> {
  const { revision, cantilever } = await revisionForMember(ctx.db, revisionId, user.id);
  const pdf = await buildPackagePdf(await packageData(ctx.db, revision, cantilever));
  return { filename: `package-${slug(cantilever.name)}-rev${revision.number}.pdf`, pdf };
}
