/** The signed-in user that passport puts on req.user (loaded fresh from the database per request). */
import type { Role } from '../shared/schemas/api';

declare global {
  namespace Express {
    interface User {
      id: number;
      email: string;
      displayName: string;
      role: Role;
      units: 'US' | 'SI';
      active: boolean;
      mustChangePassword?: boolean;
    }
  }
}

export {};
