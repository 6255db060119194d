import { FRICTION_WORDS, type LineAnswers } from '@/lib/lines/answers';
import { type DisplayUnits, formatHeadPressure, formatQuantity } from '@/lib/units';

function Card({
  label,
  value,
  note,
  tone,
}: {
  label: string;
  value: string;
  note: string;
  tone: 'ok' | 'warn' | 'bad';
}) {
  const colours = {
    ok: 'border-moss-100 bg-moss-50',
    warn: 'border-ochre-100 bg-ochre-50',
    bad: 'border-clay-100 bg-clay-50',
  }[tone];
  return (
    <div className={`rounded-lg border p-3 ${colours}`}>
      <p className="text-xs uppercase tracking-wide text-creek-700">{label}</p>
      <p className="tabular text-lg font-semibold text-creek-950">{value}</p>
      <p className="text-xs text-creek-700">{note}</p>
    </div>
  );
}

/** The answer first: flow, end pressure, worst static pressure, warnings. */
export function LineAnswersStrip({
  answers,
  units,
  temperatureC,
  flowNote,
}: {
  answers: LineAnswers;
  units: DisplayUnits;
  temperatureC: number;
  flowNote?: string;
}) {
  const a = answers;
  const endOk = a.endResidualHeadM >= a.endTargetHeadM - 1e-6;
  const staticOk = a.worstStatic.headM <= a.worstStatic.allowableHeadM;
  const warningsTone = a.counts.danger > 0 ? 'bad' : a.counts.warning > 0 ? 'warn' : 'ok';
  return (
    <section aria-label="Answers" className="grid gap-3 sm:grid-cols-2 xl:grid-cols-4" data-testid="line-answers">
      {a.overCapacity ? (
        <Card
          label="Flow delivered"
          value={`at most ${formatQuantity('designFlow', a.capacityM3s, units.system)}`}
          note={`the design flow of ${formatQuantity('designFlow', a.flowM3s, units.system)} is more than this line carries by gravity with the pressure wanted at the end`}
          tone="bad"
        />
      ) : (
        <Card
          label="Flow delivered"
          value={formatQuantity('designFlow', a.flowM3s, units.system)}
          note={
            flowNote ??
            (a.scheduled
              ? "at the start, from the network's solve; it drops at each take-off"
              : a.flowSource === 'design'
                ? 'design flow'
                : 'found by gravity between the fixed ends')
          }
          tone={a.flowM3s > 0 ? 'ok' : 'bad'}
        />
      )}
      <Card
        label="Residual at the end"
        value={formatHeadPressure(a.endResidualHeadM, units.system, temperatureC)}
        note={`wanted ${formatHeadPressure(a.endTargetHeadM, units.system, temperatureC)}`}
        tone={endOk ? 'ok' : a.endResidualHeadM < 0 ? 'bad' : 'warn'}
      />
      <Card
        label="Worst static pressure"
        value={formatHeadPressure(a.worstStatic.headM, units.system, temperatureC)}
        note={`at ch. ${formatQuantity('chainage', a.worstStatic.chainageM, units.system)}; ${a.worstStatic.pipeLabel} allows ${formatHeadPressure(a.worstStatic.allowableHeadM, units.system, temperatureC)}`}
        tone={staticOk ? 'ok' : 'bad'}
      />
      <Card
        label="Warnings"
        value={`${a.counts.danger} danger · ${a.counts.warning} warning`}
        note={`${a.counts.info} advice`}
        tone={warningsTone}
      />
      {a.frictionMethod && (
        <p className="text-xs text-creek-700 sm:col-span-2 xl:col-span-4" data-testid="friction-basis">
          {FRICTION_WORDS[a.frictionMethod]}
        </p>
      )}
    </section>
  );
}
