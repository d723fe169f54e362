export { formatCanCode, parseCanCode, type CanCodeResult } from './can-code.ts';
export {
  DEFAULT_BOTTOM_RIM_INSET_MM,
  DEFAULT_PAPER_THICKNESS_MM,
  DEFAULT_WALL_THICKNESS_MM,
  usableBottomDiameterMm,
  vesselSchema,
  VESSEL_LIMITS,
  wrapStripLengthMm,
  type Vessel,
  type VesselInput,
} from './vessel.ts';
export { vesselFromCircumference, vesselFromDiameter, type CircumferenceMeasurement, type DiameterMeasurement } from './measure.ts';
export { catalogueEntrySchema, parseCatalogue, type CatalogueEntry } from './catalogue-entry.ts';
export { parseSizeQuery, type SizeQuery } from './size-query.ts';
export { findCatalogueVessel, searchCatalogue, vesselCatalogue, vesselFromCatalogue } from './catalogue.ts';
export { diameterFromCircumference, editVessel } from './edit-vessel.ts';
