import { describe, expect, it } from 'vitest';
import { HydraulicsInputError } from '../../../hydraulics/errors';
import { domainRefusal, failedOutcomeRefusal, lineDesignRefusal } from '../../../lib/api/domain-errors';
import { appErrorOf } from '../../../lib/api/respond';
import { AppError } from '../../../lib/errors';
import { RouteEditError } from '../../../lib/routes/errors';
import { SurveyImportError } from '../../../lib/survey/errors';

describe('the one mapping from domain refusals to HTTP answers', () => {
  it('answers a core refusal 400 at its field and row', () => {
    const answer = appErrorOf(new HydraulicsInputError('stations.chainageM', 'chainage must increase', 3));
    expect(answer.status).toBe(400);
    expect(answer.toBody().error.fields).toEqual({
      'stations.chainageM.3': ['stations.chainageM[3]: chainage must increase'],
    });
    expect(appErrorOf(new HydraulicsInputError('flow.kind', 'no ram')).toBody().error.fields).toEqual({
      'flow.kind': ['flow.kind: no ram'],
    });
  });

  it('answers a route edit 400 at the point, and 409 when the route changed under it', () => {
    const invalid = appErrorOf(new RouteEditError('chainageM', 'lies before the point above it', { pointNumber: 12 }));
    expect(invalid.status).toBe(400);
    expect(invalid.toBody().error).toEqual({
      code: 'bad_request',
      message: 'point 12: lies before the point above it',
      fields: { 'points.11.chainageM': ['point 12: lies before the point above it'] },
    });
    expect(appErrorOf(new RouteEditError('route', 'the route changed', { kind: 'conflict' })).status).toBe(409);
  });

  it('answers a survey file 413 when too large, 415 when binary, else 400 at the file, naming it where asked', () => {
    expect(appErrorOf(new SurveyImportError('file-too-large', 'over 50 MB')).status).toBe(413);
    expect(appErrorOf(new SurveyImportError('binary-content', 'not text')).status).toBe(415);
    const named = new SurveyImportError('not-a-number', 'elevation "x" is not a number', {
      line: 3,
      column: 'ele',
    }).inFile('walk.csv');
    const answer = appErrorOf(named);
    expect(answer.status).toBe(400);
    expect(answer.toBody().error.fields).toEqual({
      file: ['“walk.csv”, line 3, column “ele”: elevation "x" is not a number'],
    });
  });

  it('leaves anything else to the generic answers', () => {
    expect(domainRefusal(new Error('boom'))).toBeUndefined();
    expect(appErrorOf(new Error('boom')).status).toBe(500);
    const own = new AppError('forbidden', 'no');
    expect(appErrorOf(own)).toBe(own);
  });

  it('words a line design refusal as the line page does, at the design field of a saved line or the body of a whole one', () => {
    const error = new HydraulicsInputError('devices.chainageM', 'lies outside the line', 0, {
      chainageM: 900,
      fromM: 0,
      toM: 400,
    });
    const saved = lineDesignRefusal(error, 'metric', 'design.').toBody().error;
    const whole = lineDesignRefusal(error, 'metric', '').toBody().error;
    expect(saved.fields).toEqual({
      'design.devices.chainageM.0': ['Device 1: chainage: ch. 900.0 m lies outside the line (ch. 0.0 m to 400.0 m)'],
    });
    expect(whole.fields).toEqual({ 'devices.chainageM.0': saved.fields!['design.devices.chainageM.0'] });
    expect(whole.message).toBe(saved.message);
  });

  it('refuses a failed lift computation at the field it names, or at the form when it names none', () => {
    const answer = failedOutcomeRefusal({ error: 'Measure the waste flow.', field: 'driveMeasure' });
    expect(answer.status).toBe(400);
    expect(answer.toBody().error).toEqual({
      code: 'bad_request',
      message: 'Measure the waste flow.',
      fields: { driveMeasure: ['Measure the waste flow.'] },
    });
    expect(failedOutcomeRefusal({ error: 'No plan.' }).toBody().error.fields).toEqual({ _: ['No plan.'] });
  });
});
