import { useEffect, type ReactNode } from 'react';

/** A page body with its heading; also sets the document title. */
export function Page({ title, intro, width = 'narrow', children }: { title: string; intro?: ReactNode; width?: 'narrow' | 'wide'; children: ReactNode }) {
  useEffect(() => {
    document.title = title === 'Canwright' ? title : `${title} · Canwright`;
  }, [title]);
  return (
    <div className={`mx-auto w-full px-4 py-8 ${width === 'narrow' ? 'max-w-md' : 'max-w-5xl'}`}>
      <h1 className="text-2xl font-semibold tracking-tight">{title}</h1>
      {intro && <div className="mt-2 text-ink-soft">{intro}</div>}
      <div className="mt-6">{children}</div>
    </div>
  );
}
