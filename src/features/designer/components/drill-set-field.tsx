import { useState } from 'react';
import { useFormContext, useWatch } from 'react-hook-form';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import { commonDrillSets, parseDrill, resolveDrillSet } from '../../../../shared/drills/index.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { useAccount } from '../../account/api/get-account.ts';
import { useProblems } from '../design-problems.tsx';
import { Labelled } from './field.tsx';

const EVERY = { name: 'Every drill', drillIds: [] as string[] };
const sameIds = (a: readonly string[], b: readonly string[]) => a.length === b.length && a.every((id) => b.includes(id));

/** The drills this design may call for: none (every drill), a boxed set, the account's own, or a typed list. */
export function DrillSetField({ units }: { units: UnitSystem }) {
  const { control, setValue } = useFormContext<DesignInput>();
  const set = useWatch({ control, name: 'drillSet' }) ?? EVERY;
  const ids = set.drillIds ?? [];
  const { data: account } = useAccount();
  const problemAt = useProblems();
  const boxed = commonDrillSets.filter((s) => s.drillIds.length < 400);
  const chosen = ids.length === 0 ? 'every' : boxed.findIndex((s) => sameIds(s.drillIds, ids)) >= 0 ? `set-${boxed.findIndex((s) => sameIds(s.drillIds, ids))}` : account?.drillSetIds.length && sameIds(account.drillSetIds, ids) ? 'account' : 'own';
  const labels = resolveDrillSet({ name: '', drillIds: ids }).map((d) => d.label);
  const [typing, setTyping] = useState(chosen === 'own');
  const [typed, setTyped] = useState(() => (chosen === 'own' ? labels.join(', ') : ''));
  const [unknown, setUnknown] = useState<string[]>([]);
  const put = (next: { name: string; drillIds: string[] }) => setValue('drillSet', next, { shouldDirty: true });

  function choose(value: string) {
    setTyping(value === 'own');
    if (value === 'every') put(EVERY);
    else if (value === 'account' && account) put({ name: 'My drills', drillIds: [...account.drillSetIds] });
    else if (value.startsWith('set-')) put({ ...boxed[Number(value.slice(4))]! });
    else if (value === 'own') setTyped(labels.join(', '));
  }

  function applyTyped(text: string) {
    const tokens = text.split(/[,;\n]+/).map((t) => t.trim()).filter(Boolean);
    const found = tokens.map((t) => ({ t, drill: parseDrill(t) }));
    setUnknown(found.filter((f) => !f.drill).map((f) => f.t));
    const drillIds = [...new Set(found.flatMap((f) => (f.drill ? [f.drill.id] : [])))];
    put({ name: 'My drills', drillIds });
  }

  return (
    <div className="flex flex-col gap-2">
      <Labelled label="Drills this design may use" hint={ids.length ? `${ids.length} drills: ${labels.slice(0, 8).join(', ')}${labels.length > 8 ? '…' : ''}` : `Any drill; the drill lists offer ${account?.drillSetIds.length ? 'your account’s drills' : units === 'mm' ? 'metric drills' : 'fractional, number and letter drills'}.`}>
        {(id, describedBy) => (
          <select id={id} value={typing ? 'own' : chosen} aria-describedby={describedBy} onChange={(e) => choose(e.target.value)} className="min-h-9 rounded-md border border-rule bg-white px-2 text-sm">
            <option value="every">Every drill (no set)</option>
            {boxed.map((s, i) => (
              <option key={s.name} value={`set-${i}`}>
                {s.name}
              </option>
            ))}
            {account?.drillSetIds.length ? <option value="account">My drills (from my account)</option> : null}
            <option value="own">A list I type</option>
          </select>
        )}
      </Labelled>
      {typing && (
        <Labelled label="My drills, with commas" hint="Such as 1/8, 3/16, 1/4, #7, F, 4.8 mm" error={unknown.length ? `Not drills Canwright knows: ${unknown.join(', ')}` : problemAt('drillSet', true)}>
          {(id, describedBy) => <input id={id} value={typed} aria-describedby={describedBy} onChange={(e) => setTyped(e.target.value)} onBlur={(e) => applyTyped(e.target.value)} className="min-h-9 rounded-md border border-rule bg-white px-2 text-sm" />}
        </Labelled>
      )}
    </div>
  );
}
