import type { Role } from '@chuckkey/core';

declare global {
  namespace Express {
    // The signed-in person, as passport puts it on req.user.
    interface User {
      id: string;
      email: string;
      firstName: string;
      lastName: string;
      name: string;
      role: Role;
    }
  }
}

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string;
  }
}

export {};
