'use client';

import { useRouter } from 'next/navigation';
import type { FormEvent } from 'react';
import type { RouteChoice } from '@/lib/data/line-routes';
import { useForm } from '@/lib/forms/use-form';
import { useCreateLine } from '@/lib/queries/lines';
import { displayUnits, formatQuantity, fromDisplay, type UnitSystem } from '@/lib/units';
import { parseTypedNumber } from '@/lib/units/typed-number';
import { CreateLineSchema } from '@/lib/validations/lines';
import { Button } from '@/components/ui/button';
import { useDecimalMark } from '@/components/ui/decimal-mark';
import { SelectField, TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';

/** Starts a line on a surveyed route (or a chainage window of it) with a first design to change. */
export function NewLineForm({
  projectId,
  routes,
  unitSystem,
}: {
  projectId: string;
  routes: RouteChoice[];
  unitSystem: UnitSystem;
}) {
  const router = useRouter();
  const create = useCreateLine(projectId);
  const units = displayUnits(unitSystem);
  const { fields, message, check, fail } = useForm();
  const decimalMark = useDecimalMark();

  if (routes.length === 0) {
    return (
      <p className="text-sm text-creek-700">
        This project has no surveyed route with at least two stations yet. Import or enter a survey first; a line
        follows a route.
      </p>
    );
  }

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const f = new FormData(event.currentTarget);
    // The one reading of a typed number (the project's decimal mark); unreadable text goes on as NaN so
    // the schema names the box.
    const chainage = (name: string) => {
      const typed = parseTypedNumber(String(f.get(name) ?? ''), decimalMark);
      if (!typed.ok) return Number.NaN;
      return typed.value === null ? undefined : fromDisplay('chainage', typed.value, units.system);
    };
    const input = check(CreateLineSchema, {
      name: f.get('name'),
      routeId: f.get('routeId'),
      fromChainageM: chainage('fromChainage'),
      toChainageM: chainage('toChainage'),
    });
    if (!input) return;
    try {
      const line = await create.mutateAsync(input);
      router.push(`/projects/${projectId}/lines/${line.id}`);
    } catch (error) {
      fail(error, 'The line could not be saved. Try again.');
    }
  }

  return (
    <form
      onSubmit={onSubmit}
      className="grid gap-4 sm:grid-cols-2 lg:grid-cols-[2fr_2fr_1fr_1fr_auto] lg:items-end"
      noValidate
    >
      <TextField id="name" label="Line name" placeholder="e.g. Spring box to trough" errors={fields.name} required />
      <SelectField id="routeId" label="Follows the route" errors={fields.routeId}>
        {routes.map((r) => (
          <option key={r.id} value={r.id}>
            {r.name} (ch. {formatQuantity('chainage', r.firstChainageM, units.system)} to{' '}
            {formatQuantity('chainage', r.lastChainageM, units.system)})
          </option>
        ))}
      </SelectField>
      <TextField
        id="fromChainage"
        label={`From chainage (${units.length})`}
        inputMode="decimal"
        placeholder="route start"
        errors={fields.fromChainageM}
      />
      <TextField
        id="toChainage"
        label={`To chainage (${units.length})`}
        inputMode="decimal"
        placeholder="route end"
        errors={fields.toChainageM}
      />
      <Button type="submit" disabled={create.isPending}>
        {create.isPending ? 'Starting…' : 'Start line'}
      </Button>
      <div className="sm:col-span-2 lg:col-span-5">
        <FormMessage message={message} />
      </div>
    </form>
  );
}
