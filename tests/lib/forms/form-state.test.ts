import { describe, expect, it } from 'vitest';
import { CHECK_FIELDS_NOTE, checkInput, refusalOf } from '../../../lib/forms/form-state';
import { ApiError } from '../../../lib/queries/fetch-json';
import { TankSchema } from '../../../lib/validations/tanks';

/** The one form hook's logic (lib/forms/use-form.ts), without a browser. */
describe('form state', () => {
  it('checks with the API schema: the value when it passes, the fields to mend when it does not', () => {
    const good = checkInput(TankSchema, { name: 'Header tank', volumeM3: 10 });
    expect(good.fields).toEqual({});
    expect(good.value).toMatchObject({ name: 'Header tank', volumeM3: 10, reserveDays: 0 });
    const bad = checkInput(TankSchema, { name: '', volumeM3: 0, supplyHoursPerDay: 30 });
    expect(bad.value).toBeNull();
    expect(bad.fields).toEqual({
      name: ['Tank name is required'],
      volumeM3: ['Tank volume must be more than 0'],
      supplyHoursPerDay: ['Supply hours per day must be at most 24 h'],
    });
    expect(CHECK_FIELDS_NOTE).toEqual({ text: 'Check the fields marked.', tone: 'error' });
  });

  it('puts an API refusal beside the fields it names, and anything else under the form in the fallback words', () => {
    const refused = refusalOf(
      new ApiError(400, 'bad_request', 'Some fields are not valid', { volumeM3: ['Too big'] }),
      'Not saved.',
    );
    expect(refused).toEqual({
      fields: { volumeM3: ['Too big'] },
      note: { text: 'Some fields are not valid', tone: 'error' },
    });
    expect(refusalOf(new TypeError('network down'), 'Not saved. Try again.')).toEqual({
      fields: {},
      note: { text: 'Not saved. Try again.', tone: 'error' },
    });
  });
});
