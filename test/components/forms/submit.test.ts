import { describe, expect, it } from 'vitest';
import { nestErrors, submitForm, validateWithSchema } from '@/components/forms/submit';
import { RequestError } from '@/hooks/api/request';
import { clearTagSchema } from '@/shared/schemas/tags';

/** Formik's two setters, recorded. */
function helpers() {
  const seen: { errors?: unknown; status?: unknown } = {};
  return { seen, setErrors: (e: unknown) => { seen.errors = e; }, setStatus: (s: unknown) => { seen.status = s; } };
}

describe('the form kit', () => {
  it('nests flat field paths and keeps a whole entry’s message over its parts’', () => {
    expect(nestErrors({ reason: 'Too short', 'points[1].method': 'Choose how', 'checks.testedSafe': 'Confirm' })).toEqual({
      reason: 'Too short',
      points: [undefined, { method: 'Choose how' }],
      checks: { testedSafe: 'Confirm' },
    });
    expect(nestErrors({ 'points[0]': 'Choose an item or describe it', 'points[0].method': 'Choose how' })).toEqual({ points: ['Choose an item or describe it'] });
    expect(nestErrors({ method: 'Choose how' }, (p) => `proof.${p}`)).toEqual({ proof: { method: 'Choose how' } });
  });

  it('puts a refusal’s field messages beside the fields and its words in the banner', async () => {
    const h = helpers();
    const result = await submitForm(h, () => Promise.reject(new RequestError(422, 'invalid', 'Confirm every release check before clearing an isolation.', { 'checks.testedSafe': 'Confirm this before clearing.' })));
    expect(result).toBeUndefined();
    expect(h.seen.errors).toEqual({ checks: { testedSafe: 'Confirm this before clearing.' } });
    expect(h.seen.status).toEqual({ status: 422, code: 'invalid', message: 'Confirm every release check before clearing an isolation.', fields: { 'checks.testedSafe': 'Confirm this before clearing.' } });
  });

  it('clears the banner and answers the action’s result when it succeeds', async () => {
    const h = helpers();
    h.setStatus({ status: 409, code: 'conflict', message: 'old' });
    expect(await submitForm(h, async () => ({ id: 7 }))).toEqual({ id: 7 });
    expect(h.seen.status).toBeUndefined();
    expect(h.seen.errors).toBeUndefined();
  });

  it('validates with the shared schema and its context, as the server would', async () => {
    const values = { reason: 'Seal replaced', checks: { workComplete: true, guardsRefitted: true, personnelClear: true, testedSafe: false } };
    // OSHA 29 CFR 1910.147(e)(1)–(e)(2): an isolation's release checks
    expect(await validateWithSchema(clearTagSchema, undefined, { kind: 'isolation' })(values)).toEqual({ checks: { testedSafe: 'Confirm this before clearing.' } });
    expect(await validateWithSchema(clearTagSchema, undefined, () => ({ kind: 'override' }))(values)).toEqual({});
  });
});
