/** Projects, team membership (admin) and cantilevers. */
import { Router } from 'express';
import {
  addMemberSchema,
  createCantileverSchema,
  createProjectSchema,
  updateCantileverSchema,
} from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { idParams } from '../../lib/params';
import { typedRoute } from '../../lib/route';
import { currentUser, requireRole } from '../../middleware/require-auth';
import {
  addProjectMember,
  createCantilever,
  createProject,
  getCantilever,
  updateCantilever,
  listMyProjects,
  projectCantilevers,
  projectDetail,
  removeProjectMember,
} from './projects.service';

export function projectsRouter(ctx: AppContext): Router {
  const router = Router();
  const projectParams = idParams('projectId');
  const adminOnly = requireRole(['admin'], 'manage project membership');

  router.get('/projects', async (req, res) => {
    res.json(await listMyProjects(ctx, currentUser(req)));
  });
  router.post(
    '/projects',
    typedRoute({ body: createProjectSchema }, async ({ body }, req, res) => {
      res.status(201).json(await createProject(ctx, currentUser(req), body));
    }),
  );
  router.get(
    '/projects/:projectId',
    typedRoute({ params: projectParams }, async ({ params }, req, res) => {
      res.json(await projectDetail(ctx, currentUser(req), params.projectId));
    }),
  );
  router.get(
    '/projects/:projectId/cantilevers',
    typedRoute({ params: projectParams }, async ({ params }, req, res) => {
      res.json(await projectCantilevers(ctx, currentUser(req), params.projectId));
    }),
  );
  router.post(
    '/projects/:projectId/cantilevers',
    typedRoute(
      { params: projectParams, body: createCantileverSchema },
      async ({ params, body }, req, res) => {
        res.status(201).json(await createCantilever(ctx, currentUser(req), params.projectId, body));
      },
    ),
  );
  router.post(
    '/projects/:projectId/members',
    adminOnly,
    typedRoute({ params: projectParams, body: addMemberSchema }, async ({ params, body }, req, res) => {
      res.status(201).json(await addProjectMember(ctx, currentUser(req), params.projectId, body.userId));
    }),
  );
  router.delete(
    '/projects/:projectId/members/:userId',
    adminOnly,
    typedRoute({ params: idParams('projectId', 'userId') }, async ({ params }, req, res) => {
      res.json(await removeProjectMember(ctx, currentUser(req), params.projectId, params.userId));
    }),
  );
  router.get(
    '/cantilevers/:cantileverId',
    typedRoute({ params: idParams('cantileverId') }, async ({ params }, req, res) => {
      res.json(await getCantilever(ctx, currentUser(req), params.cantileverId));
    }),
  );
  router.patch(
    '/cantilevers/:cantileverId',
    typedRoute(
      { params: idParams('cantileverId'), body: updateCantileverSchema },
      async ({ params, body }, req, res) => {
        res.json(await updateCantilever(ctx, currentUser(req), params.cantileverId, body));
      },
    ),
  );
  return router;
}
