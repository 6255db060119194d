'use client';

import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { fromDisplay, unitOf } from '@/lib/units';
import type { DraftAction } from '@/lib/routes/draft';
import type { UnitSystem } from '@/lib/units';
import { typedNumber } from '@/lib/units/decimal-mark-store';

export interface AddPointFormProps {
  /** Place along the route of the page's first row: a point goes in among the page's rows. */
  offset?: number;
  /** Rows on the page. */
  count: number;
  units: UnitSystem;
  positioned: boolean;
  dispatch: (action: DraftAction) => void;
}

const num = (v: FormDataEntryValue | null) => typedNumber(String(v ?? ''));

/** Adds a station: by position on a walked route, by chainage on a station profile. */
export function AddPointForm({ offset = 0, count, units, positioned, dispatch }: AddPointFormProps) {
  const [error, setError] = useState<string | null>(null);
  const u = unitOf('length', units);
  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const after = num(form.get('after'));
    const elevation = num(form.get('elevation'));
    const lat = num(form.get('lat'));
    const lon = num(form.get('lon'));
    const chainage = num(form.get('chainage'));
    if (!Number.isInteger(after) || after < offset || after > offset + count) {
      return setError(
        `“After point” must be a whole number from ${offset} to ${offset + count}${offset > 0 || count > 0 ? ' (the points on this page)' : ''}`,
      );
    }
    if (!Number.isFinite(elevation)) return setError('Give the elevation');
    if (positioned && (!(Math.abs(lat) <= 90) || !(Math.abs(lon) <= 180)))
      return setError('Give a latitude (−90 to 90) and longitude (−180 to 180)');
    if (!positioned && !(chainage >= 0)) return setError('Give a chainage of zero or more');
    setError(null);
    dispatch({
      type: 'insert',
      at: after - offset,
      point: {
        latitude: positioned ? lat : null,
        longitude: positioned ? lon : null,
        chainageM: positioned ? null : fromDisplay('length', chainage, units),
        elevationM: fromDisplay('length', elevation, units),
        label: String(form.get('label') ?? '').trim() || null,
        heightSource: 'typed',
        confidenceM: null,
        excluded: false,
      },
    });
    e.currentTarget.reset();
  }
  const input = 'mt-1 block w-28 rounded-md border border-creek-200 px-2 py-1 text-sm';
  return (
    <form onSubmit={onSubmit} className="flex flex-wrap items-end gap-3 text-sm" aria-label="Add a point" noValidate>
      <label>
        After point
        <input key={offset + count} name="after" defaultValue={offset + count} inputMode="numeric" className={input} />
      </label>
      {positioned ? (
        <>
          <label>
            Latitude
            <input name="lat" inputMode="decimal" className={input} />
          </label>
          <label>
            Longitude
            <input name="lon" inputMode="decimal" className={input} />
          </label>
        </>
      ) : (
        <label>
          Chainage ({u})<input name="chainage" inputMode="decimal" className={input} />
        </label>
      )}
      <label>
        Elevation ({u})<input name="elevation" inputMode="decimal" className={input} />
      </label>
      <label>
        Label
        <input name="label" className={`${input} w-40`} />
      </label>
      <Button type="submit" tone="quiet">
        Add point
      </Button>
      {error && (
        <p role="alert" className="w-full text-xs text-clay-600">
          {error}
        </p>
      )}
    </form>
  );
}
