import type { AnySchema } from 'yup';
import { unprocessable } from '@/server/lib/http-error';
import { validateFields } from '@/shared/schemas/field-errors';
import type { TagRuleContext } from '@/shared/schemas/tags';

/**
 * A tag schema run again once the tag is loaded, with what the route's check could not know (the tag's kind, the
 * actor's role, the server's clock) as yup context: the same object and rules the form ran on the device.
 * Refuses with 422, `message` in the banner and the schema's field messages beside the fields.
 */
export async function requireTagRules(schema: AnySchema, input: unknown, context: TagRuleContext, message: string): Promise<void> {
  const fields = await validateFields(schema, input, { ...context });
  if (Object.keys(fields).length) throw unprocessable(message, fields);
}
