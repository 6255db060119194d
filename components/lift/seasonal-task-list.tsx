'use client';

import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { useConfirm } from '@/components/ui/confirm-dialog';
import { SelectField, TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import type { SeasonalTaskRecord } from '@/lib/lift/records';
import { isOverdue, todayIn } from '@/lib/lift/task-due';
import {
  useAddSeasonalTask,
  useDeleteSeasonalTask,
  useGenerateSeasonalTasks,
  useUpdateSeasonalTask,
} from '@/lib/queries/lift';
import { GenerateSeasonalTasksSchema, SeasonalTaskSchema } from '@/lib/validations/seasonal-tasks';
import { NumberField } from './number-field';
import { useForm } from '@/lib/forms/use-form';
import { numberFrom } from './typed-number';

const KIND_LABEL: Record<SeasonalTaskRecord['kind'], string> = {
  'drain-down': 'Drain-down',
  refill: 'Refill',
  'silt-cleaning': 'Silt',
  'intake-screen': 'Intake screen',
  'valve-exercise': 'Valves',
  other: 'Other',
};

/** The project's dated upkeep through the year, with done flags. */
export function SeasonalTaskList({
  projectId,
  tasks,
  canEdit,
}: {
  projectId: string;
  tasks: readonly SeasonalTaskRecord[];
  canEdit: boolean;
}) {
  const update = useUpdateSeasonalTask(projectId);
  const today = todayIn(undefined);
  const remove = useDeleteSeasonalTask(projectId);
  const confirm = useConfirm();
  return (
    <div className="space-y-4">
      {confirm.dialog}
      {tasks.length === 0 ? (
        <p className="text-sm text-creek-700">
          No tasks yet{canEdit ? ": make a year of them from the site's frost dates below." : '.'}
        </p>
      ) : (
        <ul className="divide-y divide-creek-100 text-sm" aria-label="Seasonal tasks">
          {tasks.map((task) => (
            <li key={task.id} className="flex flex-wrap items-start gap-3 py-2">
              <span className="tabular w-24 shrink-0 font-medium text-creek-900">{task.dueOn}</span>
              <span className="w-24 shrink-0 rounded bg-creek-50 px-2 py-0.5 text-center text-xs text-creek-800">
                {KIND_LABEL[task.kind]}
              </span>
              {isOverdue(task, today) && (
                <span
                  className={`rounded px-2 py-0.5 text-xs font-semibold ${task.kind === 'drain-down' ? 'bg-clay-600 text-white' : 'bg-ochre-700 text-white'}`}
                  data-testid="task-overdue"
                >
                  {task.kind === 'drain-down' ? 'Overdue: drain before frost' : 'Overdue'}
                </span>
              )}
              <div className="min-w-0 flex-1">
                <p className={task.done ? 'text-creek-500 line-through' : 'font-medium text-creek-900'}>{task.title}</p>
                {task.detail && <p className="text-creek-700">{task.detail}</p>}
                {task.source && <p className="text-xs text-creek-600">Basis: {task.source}</p>}
              </div>
              {canEdit ? (
                <div className="flex items-center gap-2">
                  <label className="flex items-center gap-1 text-xs text-creek-800">
                    <input
                      type="checkbox"
                      checked={task.done}
                      onChange={(event) => update.mutate({ id: task.id, input: { done: event.target.checked } })}
                    />
                    Done{task.doneOn ? ` ${task.doneOn}` : ''}
                  </label>
                  <Button
                    tone="quiet"
                    className="px-2 py-1 text-xs"
                    onClick={() =>
                      confirm.ask({
                        title: `Delete “${task.title}” (${task.dueOn})?`,
                        body: (
                          <p>The task goes from the season&apos;s list; the other tasks stay. This cannot be undone.</p>
                        ),
                        confirmLabel: 'Delete task',
                        onConfirm: () => remove.mutateAsync(task.id),
                      })
                    }
                    aria-label={`Delete ${task.title} on ${task.dueOn}`}
                  >
                    Delete
                  </Button>
                </div>
              ) : (
                <span className="text-xs text-creek-700">{task.done ? `Done ${task.doneOn ?? ''}` : 'Open'}</span>
              )}
            </li>
          ))}
        </ul>
      )}
      {canEdit && <GenerateTasksForm projectId={projectId} />}
      {canEdit && <AddTaskForm projectId={projectId} />}
    </div>
  );
}

function GenerateTasksForm({ projectId }: { projectId: string }) {
  const [state, setState] = useState({
    year: String(new Date().getFullYear()),
    hemisphere: 'north',
    firstFrost: '10-15',
    lastFrost: '04-20',
    replace: false,
  });
  const generate = useGenerateSeasonalTasks(projectId);
  const form = useForm({
    schema: GenerateSeasonalTasksSchema,
    save: (input) => generate.mutateAsync(input),
    savedText: 'Tasks added for the year.',
  });
  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    await form.submit({
      year: numberFrom(state.year),
      hemisphere: state.hemisphere,
      firstFrost: state.firstFrost,
      lastFrost: state.lastFrost || null,
      replace: state.replace,
    });
  }
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="grid gap-3 rounded-md border border-dashed border-creek-200 p-3 sm:grid-cols-5"
      aria-label="Make a year of tasks"
    >
      <p className="text-sm font-semibold text-creek-900 sm:col-span-5">Make a year of tasks from the frost dates</p>
      <NumberField
        id="tasks-year"
        label="Year"
        value={state.year}
        onChange={(value) => setState({ ...state, year: value })}
        errors={form.fields.year}
      />
      <SelectField
        id="tasks-hemisphere"
        label="Hemisphere"
        value={state.hemisphere}
        onChange={(event) => setState({ ...state, hemisphere: event.target.value })}
        errors={form.fields.hemisphere}
      >
        <option value="north">North</option>
        <option value="south">South</option>
      </SelectField>
      <TextField
        id="tasks-firstFrost"
        label="Usual first frost (MM-DD)"
        value={state.firstFrost}
        onChange={(event) => setState({ ...state, firstFrost: event.target.value })}
        errors={form.fields.firstFrost}
      />
      <TextField
        id="tasks-lastFrost"
        label="Usual last frost (MM-DD)"
        value={state.lastFrost}
        onChange={(event) => setState({ ...state, lastFrost: event.target.value })}
        errors={form.fields.lastFrost}
      />
      <label className="flex items-end gap-2 pb-2 text-sm text-creek-800">
        <input
          type="checkbox"
          checked={state.replace}
          onChange={(event) => setState({ ...state, replace: event.target.checked })}
        />{' '}
        Replace the year&apos;s open tasks
      </label>
      <div className="flex items-center gap-3 sm:col-span-5">
        <Button type="submit" disabled={generate.isPending}>
          Make tasks
        </Button>
        <FormMessage message={form.note?.text} tone={form.note?.tone} />
      </div>
      <p className="text-xs text-creek-600 sm:col-span-5">
        Lines above frost depth are drained before the first frost; per-line drain points come from the line profiles
        once lines are designed.
      </p>
    </form>
  );
}

function AddTaskForm({ projectId }: { projectId: string }) {
  const [state, setState] = useState({ title: '', dueOn: '', kind: 'other' });
  const add = useAddSeasonalTask(projectId);
  const form = useForm({
    schema: SeasonalTaskSchema,
    save: (input) => add.mutateAsync(input),
    savedText: 'Task added.',
  });
  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    if (await form.submit({ ...state })) setState({ title: '', dueOn: '', kind: 'other' });
  }
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="grid gap-3 sm:grid-cols-[2fr_1fr_1fr_auto] sm:items-end"
      aria-label="Add a task"
    >
      <TextField
        id="task-title"
        label="Task"
        value={state.title}
        onChange={(event) => setState({ ...state, title: event.target.value })}
        errors={form.fields.title}
      />
      <TextField
        id="task-dueOn"
        label="Due"
        type="date"
        value={state.dueOn}
        onChange={(event) => setState({ ...state, dueOn: event.target.value })}
        errors={form.fields.dueOn}
      />
      <SelectField
        id="task-kind"
        label="Kind"
        value={state.kind}
        onChange={(event) => setState({ ...state, kind: event.target.value })}
      >
        {Object.entries(KIND_LABEL).map(([kind, label]) => (
          <option key={kind} value={kind}>
            {label}
          </option>
        ))}
      </SelectField>
      <Button type="submit" disabled={add.isPending}>
        Add task
      </Button>
      <div className="sm:col-span-4">
        <FormMessage message={form.note?.text} tone={form.note?.tone} />
      </div>
    </form>
  );
}
