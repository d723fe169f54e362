import { useState } from 'react';
import { newPart, ROLE_NAMES } from '../../../../shared/design/new-design.ts';
import { MAX_PARTS, partRoleSchema, type DesignInput, type PartInput, type PartRole } from '../../../../shared/design/design-schema.ts';
import { Tabs } from '../../../components/tabs.tsx';

const small = 'min-h-9 rounded-md border border-rule bg-white px-3 text-sm hover:bg-ember-50 disabled:opacity-50';

interface PartTabsProps {
  fields: { id: string }[];
  values: DesignInput;
  selected: number;
  onSelect(index: number): void;
  onAdd(part: PartInput): void;
  panelId: string;
}

/** The parts of the stove as tabs, and adding one in a chosen role. */
export function PartTabs({ fields, values, selected, onSelect, onAdd, panelId }: PartTabsProps) {
  const [role, setRole] = useState<PartRole>('shell');
  const parts = values.parts ?? [];
  const tabs = fields.map((field, i) => ({ id: field.id, label: parts[i]?.name?.trim() || ROLE_NAMES[parts[i]?.role ?? 'burn-chamber'] }));
  const full = fields.length >= MAX_PARTS;
  return (
    <div className="flex flex-wrap items-end justify-between gap-2">
      <Tabs label="Parts" tabs={tabs} selected={tabs[selected]?.id ?? ''} onSelect={(id) => onSelect(tabs.findIndex((t) => t.id === id))} panelId={panelId} />
      <div className="flex items-end gap-1">
        <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
          New part
          <select value={role} onChange={(e) => setRole(e.target.value as PartRole)} className="min-h-9 rounded-md border border-rule bg-white px-2 text-sm text-ink">
            {partRoleSchema.options.map((r) => (
              <option key={r} value={r}>
                {ROLE_NAMES[r]}
              </option>
            ))}
          </select>
        </label>
        <button type="button" className={small} disabled={full} onClick={() => onAdd(newPart(role, values))}>
          Add part
        </button>
      </div>
      {full && <p className="w-full text-xs text-ink-soft">A design holds at most {MAX_PARTS} parts.</p>}
    </div>
  );
}
