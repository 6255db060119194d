import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { fieldErrorsOf } from '@/lib/validations/common';

describe('fieldErrorsOf', () => {
  it('reports request-chosen field names that are also names of object built-ins', () => {
    const schema = z.strictObject({ name: z.string() });
    const parsed = schema.safeParse(
      JSON.parse('{"name":1,"constructor":{"prototype":{}},"__proto__":{"x":1},"toString":2}'),
    );
    expect(parsed.success).toBe(false);
    const fields = fieldErrorsOf(parsed.error!);
    expect(Object.keys(fields).sort()).toEqual(['__proto__', 'constructor', 'name', 'toString'].sort());
    expect(fields.constructor).toEqual(['Unknown field "constructor"']);
    expect(fields.name).toHaveLength(1);
  });
});
