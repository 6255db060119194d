import { beforeAll, describe, expect, it } from 'vitest';
import * as projectLines from '@/app/api/projects/[projectId]/lines/route';
import { POST as createProject } from '@/app/api/teams/[teamId]/projects/route';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;

/** Defaults chosen for the project's units where a new project or line is made (profile-and-checks.md §7.1). */
describe('new projects and lines take the defaults of their unit system', () => {
  let f: Fixture;
  beforeAll(async () => {
    f = await createTeamFixture();
  });

  const newLine = (name: string) =>
    call(projectLines.POST, {
      method: 'POST',
      path: '/api/x',
      params: { projectId: f.projectId },
      body: { name, routeId: f.lineRouteId },
      userId: f.users.designer.id,
    });

  it("a line of a US project starts on ASTM pipe with 2.5 ft of cover; of a metric project on ISO pipe with the core's cover", async () => {
    await models().Project.update({ unitSystem: 'us' }, { where: { id: f.projectId } });
    const us = await newLine('US line');
    await models().Project.update({ unitSystem: 'metric' }, { where: { id: f.projectId } });
    const metric = await newLine('Metric line');
    expect(us.status).toBe(201);
    expect(us.json.line.design.stretches).toEqual([{ fromM: 0, toM: 400, pipe: 'pe-d2239-sidr7-1.5in' }]);
    expect(us.json.line.design.settings).toEqual({ defaultCoverM: 0.762 });
    expect(metric.status).toBe(201);
    expect(metric.json.line.design.stretches).toEqual([{ fromM: 0, toM: 400, pipe: 'pe100-iso4427-sdr11-50mm' }]);
    expect(metric.json.line.design.settings).toEqual({});
  });

  it('a new US project writes decimals with a point; a metric one follows each browser until set', async () => {
    const make = (unitSystem: 'us' | 'metric') =>
      call(createProject, {
        method: 'POST',
        path: '/api/x',
        params: { teamId: f.teamId },
        body: { name: `New ${unitSystem} project`, description: '', unitSystem, siteNotes: '' },
        userId: f.users.designer.id,
      });
    const us = await make('us');
    const metric = await make('metric');
    expect(us.status).toBe(201);
    expect(us.json.project).toMatchObject({ unitSystem: 'us', decimalMark: '.' });
    expect(metric.json.project).toMatchObject({ unitSystem: 'metric', decimalMark: null });
  });
});
