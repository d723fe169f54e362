import type { Design, EndPattern, SideRow } from '../design/design-schema.ts';
import { findDrill } from '../drills/index.ts';
import { layoutDesign } from '../layout/layout-design.ts';
import { usableBottomDiameterMm } from '../vessels/vessel.ts';
import { holesForArea } from './hole-count.ts';
import { openAreaMm2 } from './open-area.ts';

/** One way to share the primary holes between a low side row and rings on the bottom. */
export interface PrimarySplit {
  sideCount: number;
  /** Counts of the bottom rings, inside out; a leading 1 is the centre hole. */
  bottomCounts: number[];
  strategy: 'divider' | 'equal-pitch';
  totalHoles: number;
  openAreaMm2: number;
  /** Resulting primary : secondary ratio. */
  ratio: number;
  /** (achieved - target) / target area. */
  offTarget: number;
  description: string;
  sideRow: SideRow | null;
  endPattern: EndPattern | null;
}

export interface SplitRequest {
  partId: string;
  /** The primary drill; every primary hole is this size (fewest sizes to buy and change). */
  drillId: string;
  /** Height of the low side row's centres above the bottom. */
  sideRowHeightMm?: number;
  limit?: number;
}

/**
 * Ways to reach the target primary area (secondary area x target ratio) with one drill, split
 * between a low side row and end rings that fit the bottom and pass the checks. Ranked by
 * closeness to the target, then ease of marking (doubling counts first, fewer rings).
 */
export function proposePrimarySplits(design: Design, request: SplitRequest): PrimarySplit[] {
  const part = design.parts.find((p) => p.id === request.partId);
  const drill = findDrill(request.drillId);
  if (!part || !drill) return [];
  const d = drill.diameterMm;
  const base = { ...design, parts: design.parts.map((p) => (p.id === part.id ? { ...p, sideRows: p.sideRows.filter((r) => r.group !== 'primary'), endPatterns: p.endPatterns.filter((e) => e.group !== 'primary') } : p)) };
  const secondary = layoutDesign(base).airflow.secondaryAreaMm2;
  if (secondary <= 0) return [];
  const target = secondary * design.airflow.targetRatio;
  const needed = holesForArea(target, d);
  const rules = design.rules;
  const outerRadius = usableBottomDiameterMm(part.vessel) / 2 - rules.rimMarginMm - d / 2;
  const sideHeight = request.sideRowHeightMm ?? rules.chimeMarginMm + d / 2 + 6;

  const candidates: PrimarySplit[] = [];
  for (let sideCount = 0; sideCount <= needed; sideCount += 4) {
    for (const [strategy, bottomCounts] of bottomOptions(needed - sideCount, outerRadius, d, rules.minLigamentMm)) {
      const total = sideCount + bottomCounts.reduce((a, b) => a + b, 0);
      const area = openAreaMm2(total, d);
      const sideRow: SideRow | null = sideCount ? { id: 'primary-side', group: 'primary', drillId: drill.id, count: sideCount, skip: [], height: { from: 'bottom', mm: sideHeight }, startDeg: 180 / sideCount, keepOuts: [], keepOutPolicy: 'drop', label: 'Low primary row' } : null;
      const endPattern = bottomCounts.length ? buildEndPattern(bottomCounts, outerRadius, drill.id) : null;
      candidates.push({
        sideCount,
        bottomCounts,
        strategy,
        totalHoles: total,
        openAreaMm2: area,
        ratio: area / secondary,
        offTarget: (area - target) / target,
        description: `${sideCount ? `${sideCount} in a low side row` : 'no side row'} + ${bottomCounts.length ? bottomCounts.join(' + ') : 'none'} on the bottom`,
        sideRow,
        endPattern,
      });
    }
  }
  const ranked = candidates
    .filter((c) => Math.abs(c.offTarget) <= 0.15)
    .sort((a, b) => Math.abs(a.offTarget) - Math.abs(b.offTarget) || ease(a) - ease(b));
  const passing: PrimarySplit[] = [];
  for (const candidate of ranked) {
    if (passing.length >= (request.limit ?? 5)) break;
    if (passesChecks(base, part.id, candidate)) passing.push(candidate);
  }
  return passing;
}

/** Apply a split: the part's primary rows and patterns are replaced by the split's. */
export function applyPrimarySplit(design: Design, partId: string, split: PrimarySplit): Design {
  return {
    ...design,
    parts: design.parts.map((p) =>
      p.id !== partId
        ? p
        : {
            ...p,
            sideRows: [...p.sideRows.filter((r) => r.group !== 'primary'), ...(split.sideRow ? [split.sideRow] : [])],
            endPatterns: [...p.endPatterns.filter((e) => e.group !== 'primary'), ...(split.endPattern ? [split.endPattern] : [])],
          },
    ),
  };
}

function ease(split: PrimarySplit): number {
  return (split.strategy === 'divider' ? 0 : 10) + split.bottomCounts.length + (split.sideCount % 8 === 0 ? 0 : 1);
}

/** Bottom ring counts near `count`: doubling rings (with or without a centre hole), then equal pitch. */
function bottomOptions(count: number, outerRadius: number, d: number, minLigament: number): ['divider' | 'equal-pitch', number[]][] {
  if (count <= 0) return [['divider', []]];
  const options: ['divider' | 'equal-pitch', number[]][] = [];
  for (const centre of [0, 1]) {
    const rings: number[] = centre ? [1] : [];
    for (let ring = 0; ring < 6; ring++) {
      rings.push(4 * 2 ** ring);
      options.push(['divider', [...rings]]);
    }
  }
  for (let ringCount = 1; ringCount <= 4 && outerRadius > 0; ringCount++) {
    const radii = Array.from({ length: ringCount }, (_, i) => (outerRadius * (i + 1)) / ringCount);
    const sum = radii.reduce((a, b) => a + b, 0);
    const counts = radii.map((r) => Math.max(1, Math.round((count * r) / sum)));
    if (counts.every((n, i) => 2 * radii[i]! * Math.sin(Math.PI / n) - d >= minLigament || n === 1)) options.push(['equal-pitch', counts]);
  }
  return options;
}

function buildEndPattern(counts: number[], outerRadius: number, drillId: string): EndPattern {
  const centre = counts[0] === 1;
  const rings = centre ? counts.slice(1) : counts;
  return {
    id: 'primary-bottom',
    label: 'Primary rings',
    group: 'primary',
    face: 'bottom',
    drillId,
    centerHole: centre,
    stagger: false,
    phaseDeg: 0,
    rings: { strategy: 'explicit', rings: rings.map((count, i) => ({ radiusMm: round((outerRadius * (i + 1)) / rings.length), count, phaseDeg: 0 })) },
  };
}

/** A split passes when none of its own holes is in an error or warning (the rest of the design is not its fault). */
function passesChecks(base: Design, partId: string, split: PrimarySplit): boolean {
  const trial = layoutDesign(applyPrimarySplit(base, partId, split));
  const own = (holeId: string) => holeId.startsWith(`${partId}:`) && (holeId.includes('/primary-side/') || holeId.includes('/primary-bottom/'));
  return !trial.findings.some((f) => f.severity !== 'note' && f.rule !== 'airflow-ratio' && f.rule !== 'drill-not-in-set' && f.holeIds.some(own));
}

/** Radii are written to 0.01 mm, rounded inwards so the outer ring keeps its rim margin. */
const round = (value: number) => Math.floor(value * 100) / 100;
