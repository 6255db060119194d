export interface ProgressBarProps {
  label: string;
  /** 0 … 1 */
  fraction: number;
  /** What is happening, shown beside the percentage. */
  detail?: string;
}

/** A determinate progress bar for long reads and uploads. */
export function ProgressBar({ label, fraction, detail }: ProgressBarProps) {
  const percent = Math.round(Math.max(0, Math.min(1, fraction)) * 100);
  return (
    <div className="space-y-1">
      <div className="flex justify-between text-xs text-creek-700">
        <span>{detail ?? label}</span>
        <span className="tabular">{percent} %</span>
      </div>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        className="h-2.5 overflow-hidden rounded-full bg-creek-100"
      >
        <div
          className="h-full rounded-full bg-creek-600 transition-[width] duration-150"
          style={{ width: `${percent}%` }}
        />
      </div>
    </div>
  );
}
