import { judgeAirflow, summarizeAirflow } from '../airflow/airflow-summary.ts';
import { totalGroups } from '../airflow/open-area.ts';
import { MAX_HOLES, type Design } from '../design/design-schema.ts';
import { validateDesign, type DesignProblem } from '../design/validate-design.ts';
import { buildPart } from './build-pieces.ts';
import type { Check, CheckContext } from './checks/check-context.ts';
import { checkDrillSet } from './checks/check-drill-set.ts';
import { checkEdges } from './checks/check-edges.ts';
import { checkJetPitch } from './checks/check-jet-pitch.ts';
import { checkDroppedHoles } from './checks/check-notes.ts';
import { checkFit } from './checks/check-fit.ts';
import { checkHeights } from './checks/check-heights.ts';
import { checkIntakeArea } from './checks/check-intake-area.ts';
import { checkTopParts } from './checks/check-top-parts.ts';
import { assemble } from './assembly.ts';
import { buildCollar } from './collar.ts';
import { checkCollar } from './checks/check-collar.ts';
import { checkSpacing } from './checks/check-spacing.ts';
import { createDrillLookup } from './drill-lookup.ts';
import { countEndPatternHoles } from './end-pattern.ts';
import type { Finding, Hole, Layout, Severity } from './layout-types.ts';

const checks: Check[] = [checkSpacing, checkEdges, checkJetPitch, checkDrillSet, checkDroppedHoles, checkFit, checkHeights, checkIntakeArea, checkTopParts, checkCollar];
const severityOrder: Record<Severity, number> = { error: 0, warning: 1, note: 2 };

/** Lays out a valid design: pieces, holes and marks in mm, group totals, airflow and findings. */
export function layoutDesign(design: Design): Layout {
  const requested = countRequestedHoles(design);
  if (requested > MAX_HOLES) return tooManyHoles(design, requested);

  const drills = createDrillLookup();
  const assembly = assemble(design);
  const layout: Layout = { designName: design.name, pieces: [], holes: [], marks: [], groups: [], airflow: summarizeAirflow([], design.airflow.targetRatio), findings: [], assembly: assembly.parts, collars: [] };
  const dropped = new Map<string, number>();
  for (const part of design.parts) {
    if (part.role === 'intake-collar') continue;
    const placed = buildPart(part, design, drills);
    layout.pieces.push(...placed.pieces);
    layout.holes.push(...placed.holes);
    layout.marks.push(...placed.marks);
    for (const [rowId, count] of placed.dropped) dropped.set(`${part.id}/${rowId}`, count);
  }

  // Collars copy the shell's intake holes, so they are built once the shell's are placed.
  const collarPieces = new Set<string>();
  const shell = assembly.shell ? design.parts.find((p) => p.id === assembly.shell!.partId) : undefined;
  for (const part of design.parts) {
    if (part.role !== 'intake-collar' || !shell) continue;
    const at = assembly.parts.find((p) => p.partId === part.id)!;
    const followedRow = shell.sideRows.find((r) => r.group === 'intake');
    const shellIntake = followedRow ? layout.holes.filter((h) => h.sourceId === followedRow.id && layout.pieces.some((piece) => piece.id === h.pieceId && piece.partId === shell.id)) : [];
    const built = buildCollar(part, at.bottomMm - assembly.shell!.bottomMm, shell, shellIntake, design);
    layout.pieces.push(built.piece);
    layout.holes.push(...built.holes);
    layout.marks.push(...built.marks);
    layout.collars.push(built.range);
    collarPieces.add(built.piece.id);
  }

  const holesByPiece = new Map<string, Hole[]>();
  for (const hole of layout.holes) {
    const list = holesByPiece.get(hole.pieceId);
    if (list) list.push(hole);
    else holesByPiece.set(hole.pieceId, [hole]);
  }
  const context: CheckContext = { design, pieces: layout.pieces, holesByPiece, dropped, assembly, collars: layout.collars };
  // A collar's holes sit over the shell's: the air passes both, so it is counted once, at the shell.
  layout.groups = totalGroups(collarPieces.size ? layout.holes.filter((h) => !collarPieces.has(h.pieceId)) : layout.holes);
  layout.airflow = summarizeAirflow(layout.groups, design.airflow.targetRatio);
  const findings: Finding[] = checks.flatMap((check) => check(context));
  findings.push(...judgeAirflow(layout.airflow));
  layout.findings = findings.sort((a, b) => severityOrder[a.severity] - severityOrder[b.severity]);
  return layout;
}

export type LayoutResult = { ok: true; layout: Layout } | { ok: false; problems: DesignProblem[] };

/** Validates any input and lays it out; a bad design gets its field paths, never an exception. */
export function layoutDocument(input: unknown): LayoutResult {
  const validation = validateDesign(input);
  return validation.ok ? { ok: true, layout: layoutDesign(validation.design) } : validation;
}

/** Holes the design asks for, counted before any is placed. */
export function countRequestedHoles(design: Design): number {
  let total = 0;
  for (const part of design.parts) {
    for (const row of part.sideRows) total += row.count - new Set(row.skip).size;
    for (const pattern of part.endPatterns) total += countEndPatternHoles(pattern);
  }
  return total;
}

function tooManyHoles(design: Design, requested: number): Layout {
  return {
    designName: design.name,
    pieces: [],
    holes: [],
    marks: [],
    groups: [],
    airflow: summarizeAirflow([], design.airflow.targetRatio),
    findings: [
      {
        rule: 'too-many-holes',
        severity: 'error',
        message: `The design asks for ${requested} holes; Canwright lays out at most ${MAX_HOLES}. Use fewer rings, fewer holes per row or a larger pitch.`,
        numbers: { requested, maximum: MAX_HOLES },
        holeIds: [],
      },
    ],
    assembly: assemble(design).parts,
    collars: [],
  };
}
