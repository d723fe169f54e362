import { useId, useState, type FormEvent } from 'react';
import type { ImportSummary } from '../../../../shared/archive/archive-format.ts';
import { archiveLimits } from '../../../../shared/archive/archive-format.ts';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { libraryExportPath, useImportLibrary } from '../api/import-library.ts';

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

function describeSummary(summary: ImportSummary): string {
  const parts = [plural(summary.designs, 'design'), plural(summary.versions, 'version'), plural(summary.burns, 'burn entry', 'burn entries'), plural(summary.photos, 'photo'), plural(summary.printerProfiles, 'printer profile')];
  return `Added ${parts.join(', ')}. ${summary.preferences === 'taken' ? 'Your preferences are now those of the archive.' : 'Your preferences stayed as they were.'}`;
}

/** The whole library out as one ZIP, and such a ZIP in (added beside what is here, never replacing it). */
export function LibraryArchive() {
  const importer = useImportLibrary();
  const [file, setFile] = useState<File>();
  const [takePreferences, setTakePreferences] = useState(false);
  const fileId = useId();
  const hintId = useId();

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    if (file) importer.mutate({ file, takePreferences });
  }

  return (
    <section aria-labelledby="library-archive-heading" className="rounded-lg border border-rule bg-white p-5 md:col-span-2">
      <h2 id="library-archive-heading" className="text-lg font-semibold">
        Your library
      </h2>
      <p className="mt-2 text-sm">
        Download everything as one .zip file: designs with every version, burn entries with their photos, printer profiles and preferences. Keep it as a copy, or import it into another account or
        another Canwright.
      </p>
      <a href={libraryExportPath} download className="mt-3 inline-flex min-h-10 items-center rounded-md bg-ember-600 px-4 py-2 text-sm font-medium text-white hover:bg-ember-700">
        Export my library (.zip)
      </a>
      <form onSubmit={onSubmit} className="mt-5 flex flex-col gap-3 border-t border-rule pt-4">
        <div className="flex flex-col gap-1">
          <label htmlFor={fileId} className="text-sm font-medium">
            Import a library (.zip)
          </label>
          <input
            id={fileId}
            type="file"
            accept=".zip,application/zip"
            aria-describedby={hintId}
            onChange={(e) => {
              setFile(e.target.files?.[0]);
              importer.reset();
            }}
            className="text-sm file:mr-3 file:min-h-10 file:rounded-md file:border file:border-rule file:bg-white file:px-4 file:py-2"
          />
          <p id={hintId} className="text-sm text-ink-soft">
            What it holds is added beside your own designs; nothing here is replaced. At most {archiveLimits.maxArchiveBytes / 1024 / 1024} MB.
          </p>
        </div>
        <label className="flex items-start gap-2 text-sm">
          <input type="checkbox" checked={takePreferences} onChange={(e) => setTakePreferences(e.target.checked)} className="mt-1 accent-ember-600" />
          Also take the archive's preferences (units, paper, drills, burn log units) instead of mine
        </label>
        <Button type="submit" variant="secondary" disabled={!file || importer.isPending} className="self-start">
          {importer.isPending ? 'Importing...' : 'Add it to my library'}
        </Button>
        {importer.isSuccess && <Notice tone="success">{describeSummary(importer.data)}</Notice>}
        {importer.isError && <Notice tone="error">{importer.error.message}</Notice>}
      </form>
    </section>
  );
}
