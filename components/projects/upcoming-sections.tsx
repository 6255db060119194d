const UPCOMING = [
  {
    title: 'Bill of materials',
    text: 'One list of pipe by size and class, fittings and devices, with quantities and prices from the lines and the network.',
  },
];

/** Capabilities still being built, labelled as such rather than faked. */
export function UpcomingSections() {
  return (
    <section aria-labelledby="upcoming-heading">
      <h2 id="upcoming-heading" className="mb-2 text-base font-semibold text-creek-900">
        Coming to this project
      </h2>
      <div className="grid gap-3 sm:grid-cols-2">
        {UPCOMING.map((s) => (
          <div key={s.title} className="rounded-lg border border-dashed border-creek-200 bg-creek-50/40 p-4">
            <p className="flex items-center gap-2 font-medium text-creek-800">
              {s.title}
              <span className="rounded-full bg-ochre-100 px-2 py-0.5 text-xs font-medium text-ochre-700">coming</span>
            </p>
            <p className="mt-1 text-sm text-creek-700">{s.text}</p>
          </div>
        ))}
      </div>
    </section>
  );
}
