import { describe, expect, it } from 'vitest';
import { designFileName, designFileText, readDesignFile } from '../../../src/features/designer/design-file.ts';
import pint from '../../../templates/pint-can-stove.json' with { type: 'json' };
import type { DesignInput } from '../../../shared/design/design-schema.ts';

const file = (name: string, text: string) => ({ name, size: new TextEncoder().encode(text).length, text: async () => text });

describe('the design file', () => {
  it('round-trips: what downloads opens again as the same design', async () => {
    const text = designFileText(pint as DesignInput)!;
    const read = await readDesignFile(file('pint.json', text));
    expect(read.ok && read.design).toEqual(JSON.parse(text));
  });

  it('refuses what is not a design, in words, naming the file', async () => {
    const notJson = await readDesignFile(file('photo.jpg', '\u00ff\u00d8 not json'));
    expect(notJson).toMatchObject({ ok: false, message: '“photo.jpg” is not a design file: it is not JSON text.' });
    const foreign = await readDesignFile(file('package.json', '{"name":"x","version":"1.0.0"}'));
    expect(foreign.ok).toBe(false);
    expect(!foreign.ok && foreign.message).toMatch(/not a Canwright design/);
    const broken = structuredClone(pint) as any;
    broken.parts[0].sideRows[0].count = 30.5;
    const bad = await readDesignFile(file('jets.json', JSON.stringify(broken)));
    expect(bad).toEqual({ ok: false, message: '“jets.json” is a design file with a problem; nothing was opened:', problems: ['Burn chamber › Secondary jets › Holes: needs a whole number'] });
  });

  it('names downloads safely', () => {
    expect(designFileName('Rowan’s first stove')).toBe('rowan-s-first-stove.json');
    expect(designFileName('Crème brûlée / 2')).toBe('creme-brulee-2.json');
    expect(designFileName('   ')).toBe('stove-design.json');
  });
});
