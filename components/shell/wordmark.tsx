export function Wordmark({ light = false }: { light?: boolean }) {
  return (
    <span
      className={`inline-flex items-center gap-2 text-lg font-semibold tracking-tight ${light ? 'text-white' : 'text-creek-900'}`}
    >
      <svg aria-hidden viewBox="0 0 32 32" className="h-7 w-7">
        <rect width="32" height="32" rx="7" fill={light ? '#2d7590' : '#1c4b5f'} />
        <path
          d="M5 10c5 0 6 5 11 5s6-5 11-5M5 17c5 0 6 5 11 5s6-5 11-5"
          fill="none"
          stroke="#abd2de"
          strokeWidth="2.6"
          strokeLinecap="round"
        />
      </svg>
      Runnel
    </span>
  );
}
