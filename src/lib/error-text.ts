import { ApiError } from './api-client';

/** An error in words for the person using the screen. */
export function errorText(error: unknown): string {
  if (error instanceof ApiError) {
    if (error.status === 401) return 'You are signed out. Sign in again to continue.';
    if (error.status === 403) return `Your role may not do this. ${error.message}`;
    if (error.status === 404) return 'This item does not exist or you are not a member of its project.';
    return error.message;
  }
  return error instanceof Error ? error.message : 'Something went wrong.';
}
