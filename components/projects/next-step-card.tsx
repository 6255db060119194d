import Link from 'next/link';
import type { NextStep } from '@/lib/projects/next-step';

/** The one thing to do next on a young project, as a link straight to it. */
export function NextStepCard({ step }: { step: NextStep }) {
  return (
    <section
      aria-labelledby="next-step-heading"
      className="rounded-lg border border-creek-200 bg-creek-50 p-4 sm:p-5"
      data-testid="next-step"
    >
      <h2 id="next-step-heading" className="text-base font-semibold text-creek-900">
        {step.title}
      </h2>
      <p className="mt-1 text-sm text-creek-800">{step.text}</p>
      <Link
        href={step.href}
        className="mt-3 inline-flex items-center rounded-md bg-creek-700 px-3.5 py-2 text-sm font-medium text-white hover:bg-creek-800"
      >
        {step.action}
      </Link>
    </section>
  );
}
