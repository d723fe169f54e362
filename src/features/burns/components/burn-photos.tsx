import { useId, useState, type ChangeEvent } from 'react';
import { MAX_PHOTO_BYTES, MAX_PHOTOS_PER_BURN, type Burn } from '../../../../shared/burns/burn-schema.ts';
import { Notice } from '../../../components/notice.tsx';
import { useAddPhoto } from '../api/add-photo.ts';
import { useDeletePhoto } from '../api/delete-photo.ts';

const accepted = ['image/jpeg', 'image/png', 'image/webp'];

/** The photos of one entry: add several at once (checked and stripped of location and camera data on the server), open or delete each. */
export function BurnPhotos({ burn }: { burn: Burn }) {
  const inputId = useId();
  const add = useAddPhoto();
  const remove = useDeletePhoto();
  const [problems, setProblems] = useState<string[]>([]);
  const [sending, setSending] = useState(0);
  const room = MAX_PHOTOS_PER_BURN - burn.photos.length;

  async function choose(event: ChangeEvent<HTMLInputElement>) {
    const files = [...(event.target.files ?? [])];
    event.target.value = '';
    const found: string[] = [];
    const fits: File[] = [];
    for (const file of files) {
      // The server decides by the file's content; these are only the refusals it would make anyway.
      if (file.type !== '' && !accepted.includes(file.type)) found.push(`“${file.name}” is not a JPEG, PNG or WebP picture.`);
      else if (file.size > MAX_PHOTO_BYTES) found.push(`“${file.name}” is larger than 15 MB. Send a smaller copy.`);
      else fits.push(file);
    }
    if (fits.length > room) found.push(`An entry holds ${MAX_PHOTOS_PER_BURN} photos; ${fits.length - Math.max(room, 0)} of these were left out.`);
    const toSend = fits.slice(0, Math.max(room, 0));
    setSending(toSend.length);
    for (const file of toSend) {
      try {
        await add.mutateAsync({ burnId: burn.id, file });
      } catch (error) {
        found.push(`“${file.name}”: ${(error as Error).message}`);
      }
      setSending((n) => n - 1);
    }
    setProblems(found);
  }

  return (
    <section aria-labelledby={`${inputId}-heading`} className="flex flex-col gap-3 rounded-lg border border-rule bg-white p-4">
      <h2 id={`${inputId}-heading`} className="font-semibold">
        Photos ({burn.photos.length} of {MAX_PHOTOS_PER_BURN})
      </h2>
      <p className="text-sm text-ink-soft">The flame ring, the char, the stove after the burn. Location and camera details are removed before a photo is kept.</p>
      {burn.photos.length > 0 && (
        <ul className="grid grid-cols-3 gap-2 sm:grid-cols-4">
          {burn.photos.map((photo, i) => (
            <li key={photo.id} className="flex flex-col gap-1">
              <a href={photo.url} target="_blank" rel="noreferrer" className="block overflow-hidden rounded-md border border-rule">
                <img src={photo.thumbnailUrl} alt={`Photo ${i + 1} of the burn`} width={photo.width} height={photo.height} loading="lazy" className="aspect-square h-auto w-full object-cover" />
              </a>
              <button type="button" onClick={() => remove.mutate(photo.id)} disabled={remove.isPending} aria-label={`Delete photo ${i + 1}`} className="min-h-9 text-sm text-danger underline">
                Delete
              </button>
            </li>
          ))}
        </ul>
      )}
      {room > 0 ? (
        <label htmlFor={inputId} className="inline-flex min-h-12 cursor-pointer items-center justify-center self-start rounded-md border border-rule bg-white px-4 py-2 text-sm font-medium hover:bg-ember-50">
          Add photos
          <input id={inputId} type="file" accept={accepted.join(',')} multiple onChange={(e) => void choose(e)} className="sr-only" />
        </label>
      ) : (
        <p className="text-sm">This entry is full. Delete a photo to add another.</p>
      )}
      <div aria-live="polite">{sending > 0 && <p className="text-sm">Sending {sending} photo{sending === 1 ? '' : 's'}…</p>}</div>
      {problems.length > 0 && (
        <Notice tone="error">
          <ul className="list-disc pl-4">
            {problems.map((p) => (
              <li key={p}>{p}</li>
            ))}
          </ul>
        </Notice>
      )}
      {remove.isError && <Notice tone="error">{remove.error.message}</Notice>}
    </section>
  );
}
