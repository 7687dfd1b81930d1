import type { QueryInterface } from 'sequelize';
import { foundation } from './0001-foundation';
import { register } from './0002-register';
import { readings } from './0003-readings';
import { tags } from './0004-tags';
import { labels } from './0005-labels';
import { notifications } from './0006-notifications';
import { tagPhotos } from './0007-tag-photos';
import { tagRules } from './0008-tag-rules';
import { visitReadings } from './0009-visit-readings';
import { connections } from './0010-connections';
import { visits } from './0011-visits';
import { readingIdempotency } from './0014-reading-idempotency';
import { boardIndexes } from './0016-board-indexes';
import { photoIdempotency } from './0017-photo-idempotency';

export interface Migration {
  name: string;
  up(params: { context: QueryInterface }): Promise<void>;
  down(params: { context: QueryInterface }): Promise<void>;
}

/** Every migration, in order. A new migration is a new file here, never an edit to an applied one. */
export const migrations: Migration[] = [foundation, register, readings, tags, labels, notifications, tagPhotos, tagRules, visitReadings, connections, visits, readingIdempotency, boardIndexes, photoIdempotency];
