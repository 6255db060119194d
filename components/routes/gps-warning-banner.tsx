import type { GpsHeightWarning } from '@/hydraulics/index';
import type { UnitSystem } from '@/lib/units';
import { gpsWarningText } from '@/lib/lines/warning-words';

/** The loud warning shown whenever a design decision would rest on consumer-GPS heights. */
export function GpsWarningBanner({ warning, units }: { warning: GpsHeightWarning; units: UnitSystem }) {
  return (
    <div role="alert" className="rounded-lg border-2 border-clay-500 bg-clay-50 p-4 text-sm text-clay-700">
      <p className="text-base font-semibold">Heights from a consumer GPS: check them before you design on them</p>
      <p className="mt-1">{gpsWarningText(warning, units)}</p>
      <p className="mt-1 text-xs">Source: {warning.reference}</p>
    </div>
  );
}
