import { paperIds, paperSizes } from '../../shared/print/paper.ts';

/** The <option>s of every paper Canwright prints on. */
export function PaperOptions() {
  return (
    <>
      {paperIds.map((id) => (
        <option key={id} value={id}>
          {paperSizes[id].name}
        </option>
      ))}
    </>
  );
}
