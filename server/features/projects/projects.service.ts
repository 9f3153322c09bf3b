/** Projects, their team and their cantilevers. */
import type { Knex } from 'knex';
import type {
  CantileverDto,
  CreateCantileverRequest,
  UpdateCantileverRequest,
  CreateProjectRequest,
  ProjectDetailDto,
  ProjectDto,
} from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { badRequest, forbidden, notFound } from '../../lib/http-error';
import { recordAudit } from '../audit/audit.repository';
import {
  insertCantilever,
  listCantilevers,
  updateCantileverQuantity,
} from '../cantilevers/cantilevers.repository';
import { saveRevision } from '../revisions/revisions.service';
import { findUserById } from '../users/users.repository';
import { cantileverForMember, projectForMember } from './project-access';
import {
  addMember,
  countCantilevers,
  findProject,
  insertProject,
  listMembers,
  listProjectsForUser,
  removeMember,
  toProjectDto,
} from './projects.repository';

const PROJECT_CREATORS = new Set(['admin', 'architect', 'engineer']);
const DESIGN_ROLES = new Set(['architect', 'fabricator', 'engineer']);

export function listMyProjects(ctx: AppContext, user: Express.User): Promise<ProjectDto[]> {
  return listProjectsForUser(ctx.db, user.id);
}

export async function createProject(
  ctx: AppContext,
  user: Express.User,
  body: CreateProjectRequest,
): Promise<ProjectDetailDto> {
  if (!PROJECT_CREATORS.has(user.role)) throw forbidden(`Your role (${user.role}) may not create projects.`);
  const id = await ctx.db.transaction(async (trx) => {
    const projectId = await insertProject(trx, { ...body, createdBy: user.id });
    await addMember(trx, projectId, user.id);
    return projectId;
  });
  return projectDetail(ctx, user, id);
}

export async function projectDetail(
  ctx: AppContext,
  user: Express.User,
  projectId: number,
): Promise<ProjectDetailDto> {
  const project = await projectForMember(ctx.db, projectId, user.id);
  const cantilevers = await listCantilevers(ctx.db, { projectId });
  return {
    ...toProjectDto(project, cantilevers.length),
    members: await listMembers(ctx.db, projectId),
    cantilevers,
  };
}

export async function projectCantilevers(
  ctx: AppContext,
  user: Express.User,
  projectId: number,
): Promise<CantileverDto[]> {
  await projectForMember(ctx.db, projectId, user.id);
  return listCantilevers(ctx.db, { projectId });
}

export async function createCantilever(
  ctx: AppContext,
  user: Express.User,
  projectId: number,
  body: CreateCantileverRequest,
): Promise<CantileverDto> {
  await projectForMember(ctx.db, projectId, user.id);
  if (!DESIGN_ROLES.has(user.role)) throw forbidden(`Your role (${user.role}) may not add cantilevers.`);
  const id = await ctx.db.transaction(async (trx) => {
    const cantileverId = await insertCantilever(trx, {
      projectId,
      name: body.name,
      description: body.description,
      quantity: body.quantity,
    });
    if (body.input) {
      const cantilever = await cantileverForMember(trx, cantileverId, user.id);
      await saveRevision(trx as Knex, user, cantilever, {
        baseRevision: null,
        message: 'First design',
        input: body.input,
      });
    }
    return cantileverId;
  });
  return (await listCantilevers(ctx.db, { id }))[0];
}

export async function getCantilever(
  ctx: AppContext,
  user: Express.User,
  cantileverId: number,
): Promise<CantileverDto> {
  await cantileverForMember(ctx.db, cantileverId, user.id);
  return (await listCantilevers(ctx.db, { id: cantileverId }))[0];
}

/** Sets how many identical beams a cantilever stands for (design roles; not a design change). */
export async function updateCantilever(
  ctx: AppContext,
  user: Express.User,
  cantileverId: number,
  body: UpdateCantileverRequest,
): Promise<CantileverDto> {
  await cantileverForMember(ctx.db, cantileverId, user.id);
  if (!DESIGN_ROLES.has(user.role)) throw forbidden(`Your role (${user.role}) may not change a cantilever.`);
  await updateCantileverQuantity(ctx.db, cantileverId, body.quantity);
  return (await listCantilevers(ctx.db, { id: cantileverId }))[0];
}

/** Admin only (checked by the router): adds an active account to a project's team. */
export async function addProjectMember(
  ctx: AppContext,
  admin: Express.User,
  projectId: number,
  userId: number,
): Promise<ProjectDetailDto> {
  const project = await findProject(ctx.db, projectId);
  if (!project) throw notFound('project');
  const account = await findUserById(ctx.db, userId);
  if (!account) throw badRequest('No such account.', [{ path: 'userId', message: 'no account has this id' }]);
  if (!account.active)
    throw badRequest('This account is disabled; enable it on the Team screen first.', [
      { path: 'userId', message: 'is a disabled account' },
    ]);
  await addMember(ctx.db, projectId, userId);
  await recordAudit(ctx.db, {
    kind: 'member-added',
    userId: admin.id,
    subject: account.email,
    detail: `project ${projectId}`,
  });
  return detailForAdmin(ctx, projectId);
}

export async function removeProjectMember(
  ctx: AppContext,
  admin: Express.User,
  projectId: number,
  userId: number,
): Promise<ProjectDetailDto> {
  const project = await findProject(ctx.db, projectId);
  if (!project) throw notFound('project');
  if ((await removeMember(ctx.db, projectId, userId)) === 0) throw notFound('member');
  await recordAudit(ctx.db, {
    kind: 'member-removed',
    userId: admin.id,
    subject: `user ${userId}`,
    detail: `project ${projectId}`,
  });
  return detailForAdmin(ctx, projectId);
}

async function detailForAdmin(ctx: AppContext, projectId: number): Promise<ProjectDetailDto> {
  const project = await findProject(ctx.db, projectId);
  if (!project) throw notFound('project');
  return {
    ...toProjectDto(project, await countCantilevers(ctx.db, projectId)),
    members: await listMembers(ctx.db, projectId),
    cantilevers: await listCantilevers(ctx.db, { projectId }),
  };
}
