import type { QueryInterface } from 'sequelize';
import { foundation } from './0001-foundation';

export interface Migration {
  name: string;
  up(params: { context: QueryInterface }): Promise<void>;
  down(params: { context: QueryInterface }): Promise<void>;
}

/** Every migration, in order. A new migration is a new file here, never an edit to an applied one. */
export const migrations: Migration[] = [foundation];
