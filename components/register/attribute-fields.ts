import type { AssetType } from '@/shared/rules/register';
import { attributeSchemas } from '@/shared/schemas/register';

interface AttributeField {
  key: string;
  kind: 'number' | 'text' | 'choice';
  options: string[];
}

/** The chosen type's fields, read from the shared schema so the form and the server never disagree. */
export function attributeFields(type: AssetType | ''): AttributeField[] {
  if (!type) return [];
  const fields = attributeSchemas[type].describe().fields as Record<string, { type: string; oneOf?: unknown[] }>;
  return Object.entries(fields).map(([key, d]) => {
    const options = (d.oneOf ?? []).filter((v): v is string => typeof v === 'string' && v !== '');
    return { key, kind: d.type === 'number' ? 'number' : options.length ? 'choice' : 'text', options };
  });
}
