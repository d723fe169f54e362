import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { repoRoot } from '../helpers/processes.ts';

const cli = (...args: string[]) =>
  spawnSync(process.execPath, ['--import', 'tsx', join(repoRoot, 'server/cli/layout-cli.ts'), ...args], { cwd: repoRoot, encoding: 'utf8' });

describe('npm run layout (CLI)', () => {
  it('prints the hole table of a template as CSV', () => {
    const run = cli('templates/pint-can-stove.json', '--format', 'csv');
    expect(run.status).toBe(0);
    const lines = run.stdout.trimEnd().split('\r\n');
    expect(lines[0]).toBe('number,piece,group,index,x_mm,y_mm,diameter_mm,drill,piece_name,row');
    expect(lines).toHaveLength(76); // 16 jets + 16 low row + 29 bottom + 14 intake, and the header
  });

  it('prints the whole layout as JSON', () => {
    const run = cli('templates/no10-can-stove.json');
    expect(run.status).toBe(0);
    const layout = JSON.parse(run.stdout);
    expect(layout.designName).toContain('No. 10');
    expect(layout.pieces.length).toBeGreaterThan(0);
  });

  it('lists the problems of an invalid file and exits 1; bad usage exits 2', () => {
    const bad = cli('package.json');
    expect(bad.status).toBe(1);
    expect(bad.stderr).toContain('schemaVersion');
    expect(cli().status).toBe(2);
    expect(cli('templates/pint-can-stove.json', '--format', 'xml').status).toBe(2);
  });
});
