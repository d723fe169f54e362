import { useRef, useState } from 'react';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import { Notice } from '../../../components/notice.tsx';
import { designFileName, designFileText, readDesignFile } from '../design-file.ts';
import { ExamplePicker } from './example-picker.tsx';

const small = 'min-h-10 rounded-md border border-rule bg-white px-3 text-sm hover:bg-ember-50 disabled:opacity-50';

interface DesignFilesProps {
  document: DesignInput;
  stale: boolean;
  onNew(): void;
  onOpen(design: DesignInput, reason: string): void;
  onExample(document: DesignInput): void;
}

/** Starting afresh, from an example or from a file, and keeping the design as its file. */
export function DesignFiles({ document, stale, onNew, onOpen, onExample }: DesignFilesProps) {
  const input = useRef<HTMLInputElement>(null);
  const [status, setStatus] = useState<{ tone: 'error' | 'success'; text: string; problems?: string[] }>();

  function download() {
    const text = designFileText(document);
    if (!text) return;
    const url = URL.createObjectURL(new Blob([text], { type: 'application/json' }));
    const link = Object.assign(window.document.createElement('a'), { href: url, download: designFileName(document.name) });
    link.click();
    setTimeout(() => URL.revokeObjectURL(url), 1000);
    setStatus({ tone: 'success', text: `Saved ${link.download}.` });
  }

  async function open(file: File | undefined) {
    if (!file) return;
    const read = await readDesignFile(file);
    if (input.current) input.current.value = '';
    if (!read.ok) return setStatus({ tone: 'error', text: read.message, problems: read.problems });
    onOpen(read.design, `opened the file “${file.name}”`);
    setStatus({ tone: 'success', text: `Opened “${read.design.name}” from ${file.name}.` });
  }

  return (
    <div className="flex w-full flex-col gap-2">
      <div className="flex flex-wrap items-end gap-2">
        <button type="button" className={small} onClick={onNew}>
          New design
        </button>
        <button type="button" className={small} onClick={() => input.current?.click()}>
          Open a design file…
        </button>
        <input ref={input} type="file" accept="application/json,.json" className="sr-only" tabIndex={-1} aria-label="Design file to open" onChange={(e) => void open(e.target.files?.[0])} />
        <button type="button" className={small} onClick={download} disabled={stale} title={stale ? 'Fix the values marked in the form first' : undefined}>
          Download design file
        </button>
        <ExamplePicker onLoad={onExample} />
      </div>
      {stale && <p className="text-xs text-ink-soft">The design file downloads once the values marked below are fixed.</p>}
      {status && (
        <Notice tone={status.tone}>
          {status.text}
          {status.problems && status.problems.length > 0 && (
            <ul className="mt-1 list-disc pl-5">
              {status.problems.map((p) => (
                <li key={p}>{p}</li>
              ))}
            </ul>
          )}
          {status.tone === 'error' && <span className="block">Nothing on screen was changed.</span>}
        </Notice>
      )}
    </div>
  );
}
