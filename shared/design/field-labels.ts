/**
 * What the design screen calls each field of the design file, and what kind of value it holds,
 * so a problem found by the schema can be said in the form's words with its limit in the
 * maker's units. Keys are the last named key of a field's path, or "parent.key" where one
 * name means different things in different places.
 */
export type FieldKind = 'length' | 'angle' | 'count' | 'ratio' | 'text' | 'choice' | 'list' | 'other';

export interface FieldLabel {
  label: string;
  kind: FieldKind;
  /** For lists: what one item is called ("row", "part"), for "at most 12 rows". */
  item?: string;
}

const f = (label: string, kind: FieldKind, item?: string): FieldLabel => ({ label, kind, item });

export const FIELD_LABELS: Record<string, FieldLabel> = {
  '(design)': f('Design', 'other'),
  schemaVersion: f('File version', 'other'),
  name: f('Design name', 'text'),
  notes: f('Notes', 'text'),
  units: f('Units', 'choice'),
  paperThicknessMm: f('Paper thickness', 'length'),
  'drillSet.name': f('Drill set name', 'text'),
  drillIds: f('Drill set', 'list', 'drill'),
  targetRatio: f('Target ratio', 'ratio'),
  minLigamentMm: f('Metal between holes', 'length'),
  jetPitchWarnMm: f('Jet pitch: warn above', 'length'),
  jetPitchErrorMm: f('Jet pitch: error above', 'length'),
  seamMarginMm: f('Clearance from the seam', 'length'),
  topMarginMm: f('Clearance below the top rim', 'length'),
  chimeMarginMm: f('Clearance above the bottom chime', 'length'),
  rimMarginMm: f('Clearance inside the rim of a can end', 'length'),
  minGapMm: f('Gap round the chamber: at least', 'length'),
  maxGapMm: f('Gap round the chamber: at most', 'length'),
  minClearanceBelowMm: f('Room under the chamber', 'length'),
  jetsBelowShellTopMm: f('Jets below the shell top', 'length'),
  minIntakeRatio: f('Shell intake against primary + secondary', 'ratio'),
  concentratorMinRatio: f('Concentrator opening: at least', 'ratio'),
  concentratorMaxRatio: f('Concentrator opening: at most', 'ratio'),
  minFlameRoomMm: f('Room for the flame under the pot', 'length'),
  minExhaustRatio: f('Pot stand openings against the flame opening', 'ratio'),
  bottomAtMm: f('Bottom stands at', 'length'),
  parts: f('Parts', 'list', 'part'),
  id: f('Id', 'text'),
  role: f('Role', 'choice'),
  'part.name': f('Part name', 'text'),
  openingDiameterMm: f('Opening diameter', 'length'),
  vessel: f('Can', 'other'),
  source: f('Can source', 'choice'),
  catalogueId: f('Catalogue can', 'choice'),
  'vessel.name': f('Can name', 'text'),
  outerDiameterMm: f('Diameter over the seam', 'length'),
  heightMm: f('Height', 'length'),
  wallThicknessMm: f('Wall thickness', 'length'),
  seamAngleDeg: f('Seam angle', 'angle'),
  bottomRimInsetMm: f('Bottom rim width', 'length'),
  sideRows: f('Rows round the wall', 'list', 'row'),
  endPatterns: f('Ring patterns', 'list', 'ring pattern'),
  label: f('Name', 'text'),
  group: f('Air', 'choice'),
  drillId: f('Drill', 'choice'),
  count: f('Holes', 'count'),
  skip: f('Left-out positions', 'list', 'position'),
  from: f('Height from', 'choice'),
  'height.mm': f('Height of centres', 'length'),
  startDeg: f('Start angle', 'angle'),
  keepOuts: f('Keep-outs', 'list', 'keep-out'),
  'keepOut.label': f('Keep-out name', 'text'),
  'keepOut.startDeg': f('Keep-out from', 'angle'),
  'keepOut.endDeg': f('Keep-out to', 'angle'),
  keepOutPolicy: f('Holes in a keep-out', 'choice'),
  face: f('Can end', 'choice'),
  centerHole: f('Centre hole', 'choice'),
  stagger: f('Stagger rings', 'choice'),
  phaseDeg: f('Turn', 'angle'),
  strategy: f('Rings', 'choice'),
  'rings.rings': f('Rings', 'list', 'ring'),
  ringCount: f('Number of rings', 'count'),
  firstCount: f('Holes in first ring', 'count'),
  firstRadiusMm: f('First ring radius', 'length'),
  ringSpacingMm: f('Ring spacing', 'length'),
  targetPitchMm: f('Target pitch', 'length'),
  radiusMm: f('Radius', 'length'),
};

/** The label of the field at a path such as "parts.0.sideRows.1.keepOuts.0.startDeg". */
export function labelField(path: string): FieldLabel {
  const keys = path.split('.').filter((k) => Number.isNaN(Number(k)));
  const last = keys.at(-1) ?? '';
  const parent = keys.at(-2) ?? '';
  const context = parent === 'keepOuts' ? 'keepOut' : parent === 'parts' ? 'part' : parent;
  return FIELD_LABELS[`${context}.${last}`] ?? FIELD_LABELS[last] ?? f(last || 'Design', 'other');
}
