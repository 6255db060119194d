import { describe, expect, it } from 'vitest';
import { nextStepOf } from '../../../lib/projects/next-step';

const all = { survey: true, design: true };

describe('next step of a project', () => {
  it('a new project leads to importing a route, then to starting a line, then stops', () => {
    expect(nextStepOf('p1', { routes: 0, surveyedRoutes: 0, lines: 0 }, all)).toMatchObject({
      href: '/projects/p1/routes/import',
      action: 'Import a route',
    });
    expect(nextStepOf('p1', { routes: 1, surveyedRoutes: 0, lines: 0 }, all)).toMatchObject({
      href: '/projects/p1/routes',
      action: 'Open the routes',
    });
    expect(nextStepOf('p1', { routes: 1, surveyedRoutes: 1, lines: 0 }, all)).toMatchObject({
      href: '/projects/p1/lines',
      action: 'Start a line',
    });
    expect(nextStepOf('p1', { routes: 1, surveyedRoutes: 1, lines: 2 }, all)).toBeNull();
  });

  it('offers only what the role may do', () => {
    // A surveyor imports the route but does not start lines; a reviewer is shown neither.
    expect(nextStepOf('p1', { routes: 0, surveyedRoutes: 0, lines: 0 }, { survey: true, design: false })?.action).toBe(
      'Import a route',
    );
    expect(nextStepOf('p1', { routes: 1, surveyedRoutes: 1, lines: 0 }, { survey: true, design: false })).toBeNull();
    expect(nextStepOf('p1', { routes: 0, surveyedRoutes: 0, lines: 0 }, { survey: false, design: false })).toBeNull();
  });
});
