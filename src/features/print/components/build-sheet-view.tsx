import type { BuildSheetContent } from '../../../../shared/print/build-sheet.ts';

/** The build sheet on screen: the same words the PDF prints after the templates. */
export function BuildSheetView({ content }: { content: BuildSheetContent }) {
  return (
    <article aria-labelledby="build-sheet-heading" className="rounded-lg border border-rule bg-white p-4 text-sm sm:p-6">
      <h2 id="build-sheet-heading" className="text-lg font-semibold">
        {content.title}
      </h2>
      <h3 className="mt-4 font-semibold">Materials</h3>
      <ul className="mt-1 list-disc space-y-0.5 pl-5">
        {content.materials.map((m) => (
          <li key={m.part}>
            <span className="font-medium">{m.part}:</span> {m.text}
          </li>
        ))}
      </ul>
      <h3 className="mt-4 font-semibold">Holes</h3>
      <table className="mt-1 w-full text-left">
        <caption className="sr-only">Holes of each part with drill and pilot sizes</caption>
        <thead className="border-b border-rule text-xs text-ink-soft">
          <tr>
            <th scope="col" className="py-1 pr-3 font-medium">Holes</th>
            <th scope="col" className="py-1 pr-3 font-medium">Numbers</th>
            <th scope="col" className="py-1 pr-3 text-right font-medium">Count</th>
            <th scope="col" className="py-1 pr-3 font-medium">Drill</th>
            <th scope="col" className="py-1 font-medium">Pilot</th>
          </tr>
        </thead>
        {content.holes.map((part) => (
          <tbody key={part.part}>
            <tr>
              <th scope="rowgroup" colSpan={5} className="pt-2 pb-0.5 font-medium">
                {part.part}
              </th>
            </tr>
            {part.groups.map((g) => (
              <tr key={g.numbers} className="border-b border-rule/60 align-top">
                <td className="py-1 pr-3">{g.label}</td>
                <td className="py-1 pr-3 tabular-nums whitespace-nowrap">{g.numbers}</td>
                <td className="py-1 pr-3 text-right tabular-nums">{g.count}</td>
                <td className="py-1 pr-3">{g.drill}</td>
                <td className="py-1">{g.pilot ?? '—'}</td>
              </tr>
            ))}
          </tbody>
        ))}
      </table>
      <h3 className="mt-4 font-semibold">Air and checks</h3>
      <p className="mt-1">{content.airflow}</p>
      {content.openChecks.length === 0 ? (
        <p className="mt-1">Checks still open: none, every check passed.</p>
      ) : (
        <ul className="mt-1 list-disc space-y-1 pl-5">
          {content.openChecks.map((check, i) => (
            <li key={i}>
              <span className="font-medium">{check.severity === 'error' ? 'Error' : 'Warning'}:</span> {check.message}
            </li>
          ))}
        </ul>
      )}
      <h3 className="mt-4 font-semibold">Order of work</h3>
      <ol className="mt-1 list-decimal space-y-1 pl-5">
        {content.orderOfWork.map((step) => (
          <li key={step}>{step}</li>
        ))}
      </ol>
      <h3 className="mt-4 font-semibold">Safety</h3>
      <ul className="mt-1 list-disc space-y-1 pl-5">
        {content.safety.map((note) => (
          <li key={note}>{note}</li>
        ))}
      </ul>
    </article>
  );
}
