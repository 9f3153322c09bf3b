/** Projects, team membership (admin) and cantilevers. */
import { Router } from 'express';
import { addMemberSchema, createCantileverSchema, createProjectSchema } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { idParams, paramId } from '../../lib/params';
import { currentUser, requireRole } from '../../middleware/require-auth';
import { validate } from '../../middleware/validate';
import {
  addProjectMember,
  createCantilever,
  createProject,
  getCantilever,
  listMyProjects,
  projectCantilevers,
  projectDetail,
  removeProjectMember,
} from './projects.service';

export function projectsRouter(ctx: AppContext): Router {
  const router = Router();
  const projectId = idParams('projectId');

  router.get('/projects', async (req, res) => {
    res.json(await listMyProjects(ctx, currentUser(req)));
  });
  router.post('/projects', validate({ body: createProjectSchema }), async (req, res) => {
    res.status(201).json(await createProject(ctx, currentUser(req), req.body));
  });
  router.get('/projects/:projectId', validate({ params: projectId }), async (req, res) => {
    res.json(await projectDetail(ctx, currentUser(req), paramId(req, 'projectId')));
  });
  router.get('/projects/:projectId/cantilevers', validate({ params: projectId }), async (req, res) => {
    res.json(await projectCantilevers(ctx, currentUser(req), paramId(req, 'projectId')));
  });
  router.post(
    '/projects/:projectId/cantilevers',
    validate({ params: projectId, body: createCantileverSchema }),
    async (req, res) => {
      res
        .status(201)
        .json(await createCantilever(ctx, currentUser(req), paramId(req, 'projectId'), req.body));
    },
  );
  router.post(
    '/projects/:projectId/members',
    requireRole(['admin'], 'manage project membership'),
    validate({ params: projectId, body: addMemberSchema }),
    async (req, res) => {
      res
        .status(201)
        .json(await addProjectMember(ctx, currentUser(req), paramId(req, 'projectId'), req.body.userId));
    },
  );
  router.delete(
    '/projects/:projectId/members/:userId',
    requireRole(['admin'], 'manage project membership'),
    validate({ params: idParams('projectId', 'userId') }),
    async (req, res) => {
      res.json(
        await removeProjectMember(ctx, currentUser(req), paramId(req, 'projectId'), paramId(req, 'userId')),
      );
    },
  );
  router.get(
    '/cantilevers/:cantileverId',
    validate({ params: idParams('cantileverId') }),
    async (req, res) => {
      res.json(await getCantilever(ctx, currentUser(req), paramId(req, 'cantileverId')));
    },
  );
  return router;
}
