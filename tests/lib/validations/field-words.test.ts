import { describe, expect, it } from 'vitest';
import { CustomPipeSchema, LineDesignSchema } from '../../../lib/validations/line-design';
import {
  CUSTOM_PIPE_WORDS,
  LINE_DESIGN_WORDS,
  NETWORK_WORDS,
  PROJECT_WORDS,
  RAM_SITE_WORDS,
  TANK_WORDS,
} from '../../../lib/validations/field-word-tables';
import { fieldErrorsIn, issuesText } from '../../../lib/validations/field-words';
import { NetworkNodeSchema } from '../../../lib/validations/network';
import { UpdateProjectSchema } from '../../../lib/validations/projects';
import { RamSiteSchema } from '../../../lib/validations/ram-sites';
import { TankSchema } from '../../../lib/validations/tanks';
import { fieldErrorsOf } from '../../../lib/validations/common';

/** Refusals speak the screen's names and the project's units (1 ft = 0.3048 m, 1 in = 25.4 mm exactly). */
const design = (patch: Record<string, unknown>) => ({
  start: { kind: 'water-level', levelM: 241 },
  end: { kind: 'outlet', elevationM: 200 },
  flow: { kind: 'design', flowM3s: 0.001 },
  stretches: [{ fromM: 0, toM: 400, pipe: 'pe100-iso4427-sdr11-50mm' }],
  ...patch,
});

function refusal<T>(schema: { safeParse: (v: unknown) => { success: boolean; error?: T } }, value: unknown): T {
  const parsed = schema.safeParse(value);
  expect(parsed.success).toBe(false);
  return parsed.error!;
}

// No internal path (devices.1.chainageM, settings.defaultCoverM) and no figure with more than three decimals.
const readable = (text: string) => {
  expect(text).not.toMatch(/\b[a-z]+\.\d+\.[a-zA-Z]+|[a-z][A-Za-z]+M\b|settings\./);
  expect(text).not.toMatch(/\d\.\d{4,}/);
};

describe("line design refusals in the project's units", () => {
  it("a pipe cover beyond the bound: feet for a US project, metres for a metric one, under the setting's screen name", () => {
    const error = refusal(LineDesignSchema, design({ settings: { defaultCoverM: 20 } }));
    // 10 m = 32.808 ft.
    expect(fieldErrorsIn(error as never, 'us', LINE_DESIGN_WORDS)).toEqual({
      'settings.defaultCoverM': ['Pipe cover must be at most 32.81 ft'],
    });
    expect(fieldErrorsIn(error as never, 'metric', LINE_DESIGN_WORDS)).toEqual({
      'settings.defaultCoverM': ['Pipe cover must be at most 10.00 m'],
    });
    // The schema's own words (what a screen showed before): metres, whatever the project.
    expect(fieldErrorsOf(error as never)['settings.defaultCoverM']).toEqual(['Pipe cover must be at most 10 m']);
  });

  it("a device in a list is named by its place, its chainage in the project's units", () => {
    const error = refusal(
      LineDesignSchema,
      design({
        devices: [
          { kind: 'washout', chainageM: 10 },
          { kind: 'washout', chainageM: 2e6 },
        ],
      }),
    );
    const us = issuesText(error as never, 'us', LINE_DESIGN_WORDS);
    // 1,000 km = 3,280,840 ft.
    expect(us).toBe('Device 2: chainage must be at most 3,280,840 ft');
    readable(us);
    expect(issuesText(error as never, 'metric', LINE_DESIGN_WORDS)).toBe(
      'Device 2: chainage must be at most 1,000,000.0 m',
    );
  });

  it("a design flow that is not a number asks for the project's flow unit; the water temperature speaks °F", () => {
    const flow = refusal(LineDesignSchema, design({ flow: { kind: 'design', flowM3s: Number.NaN } }));
    expect(issuesText(flow as never, 'us', LINE_DESIGN_WORDS)).toBe('Design flow must be a number (US gpm)');
    expect(issuesText(flow as never, 'metric', LINE_DESIGN_WORDS)).toBe('Design flow must be a number (L/s)');
    const warm = refusal(LineDesignSchema, design({ settings: { waterTemperatureC: 80 } }));
    const words = issuesText(warm as never, 'us', LINE_DESIGN_WORDS);
    expect(words).toMatch(/^Water temperature must be at most \d+ °F$/);
    readable(words);
  });

  it("a custom pipe's wall in inches, its rating in psi", () => {
    const error = refusal(CustomPipeSchema, {
      id: 'custom-x',
      label: 'X',
      material: 'pe',
      nominalSize: '1 in',
      outsideDiameterM: 0.033,
      insideDiameterM: 0.027,
      wallM: 2,
      pressureRatingPa: -1,
      hazenWilliamsC: 150,
      roughnessM: 0,
      waveSpeedMs: 300,
      source: 'maker',
    });
    const fields = fieldErrorsIn(error as never, 'us', CUSTOM_PIPE_WORDS);
    expect(fields.wallM).toEqual(['Wall must be at most 39.4 in']); // 1 m = 39.37 in
    expect(fields.pressureRatingPa).toEqual(['Pressure rating must be more than 0 psi']);
  });
});

describe("a schema's own words under the screen's name", () => {
  it("a subject that is the start of the screen's name takes the name; a reason with no subject takes it too", () => {
    const factor = refusal(LineDesignSchema, design({ settings: { safetyFactor: 0.5 } }));
    expect(issuesText(factor as never, 'us', LINE_DESIGN_WORDS)).toBe('Safety factor on ratings must be at least 1');
    const velocity = refusal(LineDesignSchema, design({ settings: { velocityMinMs: 2, velocityMaxMs: 1 } }));
    expect(issuesText(velocity as never, 'metric', LINE_DESIGN_WORDS)).toBe('Highest velocity must exceed the lowest');
    const stretch = refusal(
      LineDesignSchema,
      design({ stretches: [{ fromM: 300, toM: 100, pipe: 'pe100-iso4427-sdr11-50mm' }] }),
    );
    expect(issuesText(stretch as never, 'metric', LINE_DESIGN_WORDS)).toBe(
      'Pipe stretch 1: end: a stretch must end after it starts',
    );
  });

  it("a custom pipe's core check names the other diameter as the screen does, not by its field", () => {
    const pipe = {
      id: 'custom-x',
      label: 'X',
      material: 'pe',
      nominalSize: '1 in',
      outsideDiameterM: 0.033,
      insideDiameterM: 0.04,
      wallM: 0.003,
      pressureRatingPa: 6e5,
      hazenWilliamsC: 150,
      roughnessM: 0,
      waveSpeedMs: 300,
      source: 'maker',
    };
    const inside = fieldErrorsIn(refusal(CustomPipeSchema, pipe) as never, 'us', CUSTOM_PIPE_WORDS);
    expect(inside).toEqual({ insideDiameterM: ['Inside diameter must be less than the outside diameter'] });
    const wall = fieldErrorsIn(
      refusal(CustomPipeSchema, { ...pipe, insideDiameterM: 0.03 }) as never,
      'us',
      CUSTOM_PIPE_WORDS,
    );
    expect(wall).toEqual({ wallM: ['Wall must be at most half the outside diameter less the inside diameter'] });
    Object.values({ ...inside, ...wall })
      .flat()
      .forEach(readable);
  });
});

describe("lift and network refusals in the project's units", () => {
  it("a network part above the highest elevation: feet, under the form's label", () => {
    const error = refusal(NetworkNodeSchema, { kind: 'outlet', name: 'Trough', elevationM: 9500 });
    // 9,000 m = 29,527.56 ft.
    expect(fieldErrorsIn(error as never, 'us', NETWORK_WORDS).elevationM).toEqual([
      'Elevation must be at most 29,527.56 ft',
    ]);
    expect(fieldErrorsIn(error as never, 'metric', NETWORK_WORDS).elevationM).toEqual([
      'Elevation must be at most 9,000.00 m',
    ]);
  });

  it("a ram site's pump elevation and a tank outlet, each named as on the Lift & storage page", () => {
    const ram = refusal(RamSiteSchema, {
      name: 'Ram',
      driveFlowM3s: 0.0003,
      fallM: 2,
      liftM: 10,
      pumpElevationM: -900,
      drivePipe: { lengthM: 14, insideDiameterM: 0.035, material: 'steel' },
      deliveryPipe: { lengthM: 100, insideDiameterM: 0.02 },
    });
    const ramFields = fieldErrorsIn(ram as never, 'us', RAM_SITE_WORDS);
    expect(ramFields.pumpElevationM).toEqual(['Pump elevation must be at least -1,640.42 ft']); // -500 m
    const tank = refusal(TankSchema, {
      name: 'Top',
      volumeM3: 2,
      outlets: [{ label: 'House', elevationM: Number.NaN, residualHeadM: 10, frictionLossM: 1 }],
    });
    const tankFields = fieldErrorsIn(tank as never, 'us', TANK_WORDS);
    expect(tankFields['outlets.0.elevationM']).toEqual(['Outlet 1: elevation must be a number (ft)']);
    Object.values({ ...ramFields, ...tankFields })
      .flat()
      .forEach(readable);
  });

  it("a project's frost depth beyond the bound reads in feet for a US project", () => {
    const error = refusal(UpdateProjectSchema, { frostDepthM: 12 });
    // 10 m = 32.81 ft.
    expect(fieldErrorsIn(error as never, 'us', PROJECT_WORDS).frostDepthM).toEqual([
      'Frost depth must be at most 32.81 ft',
    ]);
  });
});
