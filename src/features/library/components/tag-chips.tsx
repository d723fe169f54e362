/** A design's tags as small labels; "None" when it has none. */
export function TagChips({ tags }: { tags: string[] }) {
  if (tags.length === 0) return <span className="text-sm text-ink-soft">None</span>;
  return (
    <ul aria-label="Tags" className="inline-flex flex-wrap gap-1">
      {tags.map((tag) => (
        <li key={tag} className="rounded-full border border-rule bg-paper px-2 py-0.5 text-xs">
          {tag}
        </li>
      ))}
    </ul>
  );
}
