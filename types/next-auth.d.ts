// Adds the firm, role and units to next-auth's session, user and token types.
import type { DefaultSession } from 'next-auth';
import type { Role, Units } from '@/models/constants';

declare module 'next-auth' {
  interface Session {
    user: {
      id: string;
      firmId: string;
      role: Role;
      name: string;
      email: string;
      units: Units;
    } & Omit<DefaultSession['user'], 'name' | 'email'>;
  }

  interface User {
    id: string;
    firmId: string;
    role: Role;
    units: Units;
  }
}

declare module 'next-auth/jwt' {
  interface JWT {
    id: string;
    firmId: string;
    role: Role;
    units: Units;
  }
}
