import data from '../../templates/catalogue/vessels.json' with { type: 'json' };
import { parseCatalogue, type CatalogueEntry } from './catalogue-entry.ts';
import { searchEntries } from './catalogue-search.ts';
import { vesselSchema, type Vessel } from './vessel.ts';

/** The built-in can sizes, checked once at load: a bad entry is our bug, so fail loudly. */
export const vesselCatalogue: readonly CatalogueEntry[] = parseCatalogue(data, 'templates/catalogue/vessels.json');

export function findCatalogueVessel(id: string): CatalogueEntry | undefined {
  return vesselCatalogue.find((entry) => entry.id === id);
}

/** Search by code ("303x406", "303"), name ("no. 10", "paint") or diameter ("81 mm", "3 3/16"). */
export function searchCatalogue(query: string): CatalogueEntry[] {
  return searchEntries(vesselCatalogue, query);
}

/** A vessel for a catalogue size; throws on an unknown id (ids come from this catalogue). */
export function vesselFromCatalogue(id: string): Vessel {
  const entry = findCatalogueVessel(id);
  if (!entry) throw new Error(`No vessel "${id}" in the catalogue.`);
  return vesselSchema.parse({
    source: 'catalogue',
    catalogueId: entry.id,
    name: entry.name,
    outerDiameterMm: entry.diameterMm,
    heightMm: entry.heightMm,
    wallThicknessMm: entry.wallThicknessMm,
    bottomRimInsetMm: entry.bottomRimInsetMm,
  });
}
