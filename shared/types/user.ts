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

export interface ListResponse<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export interface ApiErrorBody {
  error: { code: string; message: string; fields?: Record<string, string> };
}
