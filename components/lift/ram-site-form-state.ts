import { findPipe, PIPE_SERIES, type RamEfficiencyTableId } from '@/hydraulics/index';
import type { RamSiteRecord } from '@/lib/lift/records';
import { fromDisplay, inputValue, unitDefaults, type UnitSystem } from '@/lib/units';
import { numberFrom, numberOrNull } from './typed-number';

/** The ram form's boxes, as typed (project units). */
export interface RamSiteFormState {
  name: string;
  sourceId: string;
  tankId: string;
  driveFlow: string;
  fall: string;
  driveLength: string;
  driveBore: string;
  driveMaterial: string;
  driveRigid: 'auto' | 'yes' | 'no';
  lift: string;
  pumpElevation: string;
  routeId: string;
  deliveryLength: string;
  /** A catalogue series id, or "custom" for bore + C. */
  pipeSeries: string;
  pipeId: string;
  deliveryBore: string;
  hazenC: string;
  rating: string;
  sizeClassId: string;
  pumpCount: string;
  measuredEfficiencyPercent: string;
  efficiencyTableId: RamEfficiencyTableId;
  notes: string;
}

/**
 * An empty ram form: the delivery pipe opens on the project's pipe series (ASTM in a US project, ISO in a metric one).
 */
export function emptyRamSiteForm(units: UnitSystem): RamSiteFormState {
  return {
    name: '',
    sourceId: '',
    tankId: '',
    driveFlow: '',
    fall: '',
    driveLength: '',
    driveBore: '',
    driveMaterial: 'steel',
    driveRigid: 'auto',
    lift: '',
    pumpElevation: '',
    routeId: '',
    deliveryLength: '',
    pipeSeries: unitDefaults(units).pipeSeriesId,
    pipeId: '',
    deliveryBore: '',
    hazenC: '150',
    rating: '',
    sizeClassId: '',
    pumpCount: '1',
    measuredEfficiencyPercent: '',
    efficiencyTableId: 'trade-pocketbook',
    notes: '',
  };
}

/** Catalogue series of each pipe, so the form can offer series and size apart. */
const SERIES_OF_PIPE = new Map(
  PIPE_SERIES.flatMap((series) => series.pipes.map((pipe) => [pipe.id, series.id] as const)),
);

export function ramSiteFormFrom(site: RamSiteRecord, units: UnitSystem): RamSiteFormState {
  const { drivePipe, deliveryPipe } = site;
  const pipe = deliveryPipe.pipeId ? findPipe(deliveryPipe.pipeId) : undefined;
  return {
    name: site.name,
    sourceId: site.sourceId ?? '',
    tankId: site.tankId ?? '',
    driveFlow: inputValue('flow', site.driveFlowM3s, units),
    fall: inputValue('head', site.fallM, units),
    driveLength: inputValue('length', drivePipe.lengthM, units),
    driveBore: inputValue('diameter', drivePipe.insideDiameterM, units),
    driveMaterial: drivePipe.material,
    driveRigid: drivePipe.rigid === null ? 'auto' : drivePipe.rigid ? 'yes' : 'no',
    lift: inputValue('head', site.liftM, units),
    pumpElevation: inputValue('elevation', site.pumpElevationM, units),
    routeId: deliveryPipe.routeId ?? '',
    deliveryLength: inputValue('length', deliveryPipe.lengthM, units),
    pipeSeries: pipe ? (SERIES_OF_PIPE.get(pipe.id) ?? 'custom') : 'custom',
    pipeId: pipe?.id ?? '',
    deliveryBore: inputValue('diameter', deliveryPipe.insideDiameterM, units),
    hazenC: deliveryPipe.hazenWilliamsC === null ? '150' : String(deliveryPipe.hazenWilliamsC),
    rating: inputValue('pressure', deliveryPipe.pressureRatingPa, units),
    sizeClassId: site.sizeClassId ?? '',
    pumpCount: String(site.pumpCount),
    measuredEfficiencyPercent:
      site.measuredEfficiency === null ? '' : String(Number((site.measuredEfficiency * 100).toPrecision(4))),
    efficiencyTableId: site.efficiencyTableId,
    notes: site.notes,
  };
}

/** The boxes as the API body (SI); the schema then says what is missing or wrong. */
export function ramSiteInputFrom(state: RamSiteFormState, units: UnitSystem) {
  const si = (quantity: Parameters<typeof fromDisplay>[0], text: string) =>
    fromDisplay(quantity, numberFrom(text), units);
  const siOrNull = (quantity: Parameters<typeof fromDisplay>[0], text: string) => {
    const value = numberOrNull(text);
    return value === null ? null : fromDisplay(quantity, value, units);
  };
  const catalogue = state.pipeSeries !== 'custom';
  const efficiency = numberOrNull(state.measuredEfficiencyPercent);
  return {
    name: state.name,
    sourceId: state.sourceId || null,
    tankId: state.tankId || null,
    driveFlowM3s: si('flow', state.driveFlow),
    fallM: si('head', state.fall),
    drivePipe: {
      lengthM: si('length', state.driveLength),
      insideDiameterM: si('diameter', state.driveBore),
      material: state.driveMaterial,
      rigid: state.driveRigid === 'auto' ? null : state.driveRigid === 'yes',
    },
    liftM: si('head', state.lift),
    pumpElevationM: siOrNull('elevation', state.pumpElevation),
    deliveryPipe: {
      routeId: state.routeId || null,
      lengthM: state.routeId ? null : siOrNull('length', state.deliveryLength),
      pipeId: catalogue && state.pipeId ? state.pipeId : null,
      insideDiameterM: catalogue ? null : siOrNull('diameter', state.deliveryBore),
      hazenWilliamsC: catalogue ? null : numberOrNull(state.hazenC),
      pressureRatingPa: catalogue ? null : siOrNull('pressure', state.rating),
    },
    sizeClassId: state.sizeClassId || null,
    pumpCount: numberFrom(state.pumpCount),
    measuredEfficiency: efficiency === null ? null : efficiency / 100,
    efficiencyTableId: state.efficiencyTableId,
    notes: state.notes,
  };
}
