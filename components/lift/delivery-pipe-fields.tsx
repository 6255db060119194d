'use client';

import { PIPE_SERIES, pipesOfSeries } from '@/hydraulics/index';
import { SelectField } from '@/components/ui/field';
import type { FieldErrors } from '@/lib/errors';
import type { RouteOption } from '@/lib/lift/records';
import { formatQuantity, unitOf, type UnitSystem } from '@/lib/units';
import { NumberField } from './number-field';
import type { RamSiteFormState } from './ram-site-form-state';

export interface DeliveryPipeFieldsProps {
  state: RamSiteFormState;
  set: <K extends keyof RamSiteFormState>(key: K, value: RamSiteFormState[K]) => void;
  fields: FieldErrors;
  routes: readonly RouteOption[];
  units: UnitSystem;
}

/** Delivery pipe: a surveyed route or a length; a catalogue pipe (series, then size) or bore, C and rating. */
export function DeliveryPipeFields({ state, set, fields, routes, units }: DeliveryPipeFieldsProps) {
  const custom = state.pipeSeries === 'custom';
  return (
    <fieldset className="grid gap-3 rounded-md border border-creek-100 p-3 sm:grid-cols-3">
      <legend className="px-1 text-sm font-semibold text-creek-900">Delivery pipe</legend>
      <SelectField
        id="ram-routeId"
        label="Follows route"
        value={state.routeId}
        onChange={(event) => set('routeId', event.target.value)}
        errors={fields['deliveryPipe.routeId']}
      >
        <option value="">No route: enter the length</option>
        {routes.map((route) => (
          <option key={route.id} value={route.id}>
            {route.name} ({formatQuantity('length', route.lengthM, units)})
          </option>
        ))}
      </SelectField>
      {state.routeId ? (
        <p className="self-end text-sm text-creek-700">Length taken from the surveyed route.</p>
      ) : (
        <NumberField
          id="ram-deliveryLength"
          label="Delivery pipe length"
          unit={unitOf('length', units)}
          value={state.deliveryLength}
          onChange={(value) => set('deliveryLength', value)}
          errors={fields['deliveryPipe.lengthM']}
        />
      )}
      <SelectField
        id="ram-pipeSeries"
        label="Pipe"
        value={state.pipeSeries}
        onChange={(event) => {
          set('pipeSeries', event.target.value);
          set('pipeId', '');
        }}
      >
        <option value="custom">Other pipe: enter bore and C</option>
        {PIPE_SERIES.map((series) => (
          <option key={series.id} value={series.id}>
            {series.label}
          </option>
        ))}
      </SelectField>
      {custom ? (
        <>
          <NumberField
            id="ram-deliveryBore"
            label="Delivery pipe bore"
            unit={unitOf('diameter', units)}
            value={state.deliveryBore}
            onChange={(value) => set('deliveryBore', value)}
            errors={fields['deliveryPipe.insideDiameterM']}
          />
          <NumberField
            id="ram-hazenC"
            label="Hazen-Williams C"
            value={state.hazenC}
            onChange={(value) => set('hazenC', value)}
            errors={fields['deliveryPipe.hazenWilliamsC']}
            hint="About 150 for PE and PVC, 120 for galvanised steel"
          />
          <NumberField
            id="ram-rating"
            label="Pressure rating"
            unit={unitOf('pressure', units)}
            value={state.rating}
            onChange={(value) => set('rating', value)}
            errors={fields['deliveryPipe.pressureRatingPa']}
            hint="From the pipe maker; leave blank if not known"
          />
        </>
      ) : (
        <SelectField
          id="ram-pipeId"
          label="Size"
          value={state.pipeId}
          onChange={(event) => set('pipeId', event.target.value)}
          errors={fields['deliveryPipe.pipeId'] ?? fields['deliveryPipe.insideDiameterM']}
        >
          <option value="">Choose a size</option>
          {pipesOfSeries(state.pipeSeries).map((pipe) => (
            <option key={pipe.id} value={pipe.id}>
              {pipe.label}
            </option>
          ))}
        </SelectField>
      )}
    </fieldset>
  );
}
