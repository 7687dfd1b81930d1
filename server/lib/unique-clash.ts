import { UniqueConstraintError } from 'sequelize';
import { generateLabelCode } from '@/shared/rules/label-code';

/** True when `err` is a duplicate-key error on the named unique index. */
export function isUniqueClash(err: unknown, indexName: string): boolean {
  if (!(err instanceof UniqueConstraintError)) return false;
  const parent = (err as UniqueConstraintError & { parent?: { message?: string } }).parent;
  return String(parent?.message ?? err.message).includes(indexName) || Object.keys(err.fields ?? {}).includes(indexName);
}

export const LABEL_CODE_INDEX = 'assets_label_code_unique';

/**
 * Runs `insert` with a fresh label code, again with a new code if the unique index reports a clash
 * (rare: see shared/rules/label-code.ts). Inside a MariaDB transaction a duplicate-key error undoes only
 * the failed statement, so retrying within the same transaction is safe.
 */
export async function insertWithLabelCode<T>(insert: (code: string) => Promise<T>, generate: () => string = generateLabelCode, attempts = 5): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await insert(generate());
    } catch (err) {
      if (attempt < attempts && isUniqueClash(err, LABEL_CODE_INDEX)) continue;
      throw err;
    }
  }
}
