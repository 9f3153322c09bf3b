/** Projects and their members (Knex only). */
import type { Knex } from 'knex';
import type { MemberDto, ProjectDto, Role } from '../../../shared/schemas/api';
import { nowIso, toIso, insertReturningId } from '../../db/knex';

type Db = Knex | Knex.Transaction;

export interface ProjectRow {
  id: number;
  name: string;
  site: string;
  code_basis: string;
  units: 'US' | 'SI';
  created_by: number;
  created_at: string;
}

export function toProjectDto(row: ProjectRow, cantileverCount: number): ProjectDto {
  return {
    id: row.id,
    name: row.name,
    site: row.site,
    codeBasis: row.code_basis,
    units: row.units,
    createdAt: toIso(row.created_at),
    cantileverCount,
  };
}

export async function findProject(db: Db, id: number): Promise<ProjectRow | undefined> {
  return db<ProjectRow>('projects').where({ id }).first();
}

export async function isMember(db: Db, projectId: number, userId: number): Promise<boolean> {
  const row = await db('project_members')
    .where({ project_id: projectId, user_id: userId })
    .first<{ user_id: number } | undefined>('user_id');
  return row !== undefined;
}

export async function listProjectsForUser(db: Db, userId: number): Promise<ProjectDto[]> {
  const rows = (await db('projects as p')
    .join('project_members as m', 'm.project_id', 'p.id')
    .where('m.user_id', userId)
    .select('p.*')
    .select(db.raw('(select count(*) from cantilevers c where c.project_id = p.id) as cantilever_count'))
    .orderBy('p.name')) as (ProjectRow & { cantilever_count: number | string })[];
  return rows.map((r) => toProjectDto(r, Number(r.cantilever_count)));
}

export async function countCantilevers(db: Db, projectId: number): Promise<number> {
  const [row] = await db('cantilevers')
    .where({ project_id: projectId })
    .count<{ n: number | string }[]>({ n: '*' });
  return Number(row.n);
}

export async function insertProject(
  db: Db,
  p: { name: string; site: string; codeBasis: string; units: 'US' | 'SI'; createdBy: number },
): Promise<number> {
  return insertReturningId(db, 'projects', {
    name: p.name,
    site: p.site,
    code_basis: p.codeBasis,
    units: p.units,
    created_by: p.createdBy,
    created_at: nowIso(),
  });
}

export async function addMember(db: Db, projectId: number, userId: number): Promise<void> {
  await db('project_members')
    .insert({ project_id: projectId, user_id: userId, created_at: nowIso() })
    .onConflict(['project_id', 'user_id'])
    .ignore();
}

export async function removeMember(db: Db, projectId: number, userId: number): Promise<number> {
  return db('project_members').where({ project_id: projectId, user_id: userId }).del();
}

export async function listMembers(db: Db, projectId: number): Promise<MemberDto[]> {
  const rows = (await db('project_members as m')
    .join('users as u', 'u.id', 'm.user_id')
    .where('m.project_id', projectId)
    .select('u.id', 'u.email', 'u.display_name', 'u.role')
    .orderBy('u.display_name')) as { id: number; email: string; display_name: string; role: Role }[];
  return rows.map((r) => ({ userId: r.id, email: r.email, displayName: r.display_name, role: r.role }));
}

/** E-mail addresses of the project's active members with a role (for notifications). */
export async function memberEmailsWithRole(
  db: Db,
  projectId: number,
  role: Role,
): Promise<{ id: number; email: string }[]> {
  return db('project_members as m')
    .join('users as u', 'u.id', 'm.user_id')
    .where({ 'm.project_id': projectId, 'u.role': role, 'u.active': true })
    .select('u.id', 'u.email')
    .orderBy('u.id');
}

export interface Recipient {
  id: number;
  email: string;
  displayName: string;
  role: Role;
}

/** The project's active members (for notifications), optionally of one role. */
export async function activeMembers(db: Db, projectId: number, role?: Role): Promise<Recipient[]> {
  const q = db('project_members as m')
    .join('users as u', 'u.id', 'm.user_id')
    .where({ 'm.project_id': projectId, 'u.active': true })
    .select('u.id', 'u.email', 'u.display_name', 'u.role')
    .orderBy('u.id');
  if (role) q.where('u.role', role);
  const rows = (await q) as { id: number; email: string; display_name: string; role: Role }[];
  return rows.map((r) => ({ id: r.id, email: r.email, displayName: r.display_name, role: r.role }));
}
