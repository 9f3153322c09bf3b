import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { cantileverQueryOptions } from '../../lib/api/cantilevers/get-cantilever';
import { meQueryOptions } from '../../lib/api/me/get-me';
import { revisionQueryOptions } from '../../lib/api/revisions/get-revision';

/**
 * What the desk opens on: the cantilever's current revision at the moment the route is entered
 * (null: nothing saved yet; undefined: the cantilever could not be read, the route shows why).
 * From then on the desk's base is its own (later saves move it), whatever the cantilever's pointer does.
 */
export interface DeskOpening {
  revisionId: number | null | undefined;
}

/**
 * The desk's route loader: the person, the cantilever and its current revision are in the query
 * cache before the desk renders, so the desk starts on them without a state set during render.
 * It never throws: a refused or failed read stays in the query's error (the route shows it in
 * words), and a signed-out visit is still sent to the sign-in page by the auth route.
 */
export function deskLoader(queryClient: QueryClient) {
  return async ({ params }: LoaderFunctionArgs): Promise<DeskOpening> => {
    const cantileverId = Number(params.cantileverId);
    const opening: DeskOpening = { revisionId: undefined };
    try {
      const [cantilever] = await Promise.all([
        // Read again on every opening (staleTime 0): the pointer may have moved since it was cached.
        queryClient.fetchQuery({ ...cantileverQueryOptions(cantileverId), staleTime: 0 }),
        queryClient.ensureQueryData(meQueryOptions()),
      ]);
      opening.revisionId = cantilever.currentRevisionId;
      if (cantilever.currentRevisionId !== null)
        await queryClient.ensureQueryData(revisionQueryOptions(cantilever.currentRevisionId));
    } catch {
      // The error is kept by the query that failed; the route reads it from there.
    }
    return opening;
  };
}
