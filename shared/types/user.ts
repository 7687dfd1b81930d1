import type { Role } from '@/shared/rules/roles';

export interface User {
  id: number;
  name: string;
  email: string;
  role: Role;
  organisation: { id: number; name: string };
}

export interface SignInResponse {
  token: string;
  user: User;
}

// Moved to the API contract module; kept here for the files that still import them from this one.
export type { ApiErrorBody, ListResponse } from '@/shared/types/api';
