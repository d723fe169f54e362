import { setImmediate as nextTurn } from 'node:timers/promises';
import type { z } from 'zod';
import type { Preferences } from '../../shared/account/preferences.ts';
import { ARCHIVE_PHOTO_NAME, archiveFileNames, archiveLimits, archivePhotoExtension, LIBRARY_ARCHIVE_FORMAT, LIBRARY_ARCHIVE_SCHEMA_VERSION, manifestHeadSchema, manifestSchema, type Manifest } from '../../shared/archive/archive-format.ts';
import { archivedDesignSchema, burnsFileSchema, designsFileSchema, preferencesFileSchema, printerProfilesFileSchema, type ArchivedBurn, type ArchivedDesign, type ArchivedPrinterProfile } from '../../shared/archive/archive-schemas.ts';
import type { DesignSummary } from '../../shared/library/library-schemas.ts';
import { summarizeDesign } from '../../shared/library/summarize-design.ts';
import { findDrill } from '../../shared/drills/index.ts';
import { AppError } from '../http/app-error.ts';
import { parseInput } from '../http/validate.ts';
import type { ArchiveEntries } from './read-archive.ts';

/** Everything in an archive, checked, with the summary of each version worked out again (never taken from the file). */
export interface LibraryContent {
  manifest: Manifest;
  designs: (ArchivedDesign & { summaries: DesignSummary[] })[];
  burns: ArchivedBurn[];
  profiles: ArchivedPrinterProfile[];
  preferences: Preferences;
}

const refuse = (message: string) => new AppError(422, 'ARCHIVE_INVALID', `${message} Nothing was imported.`);
const notALibrary = (why: string) => new AppError(400, 'NOT_A_LIBRARY', `This ZIP is not a Canwright library: ${why}. Choose the .zip file Canwright saved when you exported your library.`);

/** The names an archive may hold: the five JSON files and photos. Anything else is refused before a byte is read. */
export function acceptArchiveName(name: string): AppError | undefined {
  if ((Object.values(archiveFileNames) as string[]).includes(name) || ARCHIVE_PHOTO_NAME.test(name)) return undefined;
  return notALibrary(`it holds ${JSON.stringify(name.slice(0, 80))}, a file Canwright does not write`);
}

/** Reads a JSON file of the archive and checks it with its schema; a problem names the file and the field. */
async function readJson<S extends z.ZodType>(archive: ArchiveEntries, name: string, schema: S): Promise<z.output<S>> {
  if (!archive.has(name)) throw refuse(`The archive has no ${name}, so it is incomplete.`);
  return parseFile(schema, name, parseJson(await archive.read(name, archiveLimits.maxJsonBytes), name));
}

function parseJson(bytes: Buffer, name: string): unknown {
  try {
    return JSON.parse(bytes.toString('utf8'));
  } catch {
    throw refuse(`The archive's ${name} is not readable JSON (it may have been edited by hand or damaged).`);
  }
}

/** parseInput (the API's own checks and words), with the file named in the message and in each field's path. */
function parseFile<S extends z.ZodType>(schema: S, name: string, value: unknown, at = ''): z.output<S> {
  try {
    return parseInput(schema, value);
  } catch (error) {
    if (!(error instanceof AppError) || error.code !== 'INVALID_INPUT') throw error;
    const fields = ((error.details as { fields?: { path: string; message: string }[] })?.fields ?? []).slice(0, 20).map((f) => ({ path: `${name} ${at}${f.path === '(body)' ? '' : f.path}`.trim(), message: f.message }));
    const first = fields[0];
    throw new AppError(422, 'ARCHIVE_INVALID', `The archive's ${name} does not hold what Canwright writes there${first ? ` (${first.path}: ${first.message})` : ''}. Nothing was imported.`, { fields });
  }
}

/** The manifest says what this file is; a foreign or newer one is refused before anything else is read. */
async function readManifest(archive: ArchiveEntries): Promise<Manifest> {
  if (!archive.has(archiveFileNames.manifest)) throw notALibrary('it has no manifest.json');
  const raw = parseJson(await archive.read(archiveFileNames.manifest, archiveLimits.maxJsonBytes), archiveFileNames.manifest);
  const head = manifestHeadSchema.safeParse(raw);
  if (!head.success || head.data.format !== LIBRARY_ARCHIVE_FORMAT) throw notALibrary('its manifest.json is not that of a Canwright library');
  const version = head.data.schemaVersion;
  if (version !== LIBRARY_ARCHIVE_SCHEMA_VERSION) {
    const newer = typeof version === 'number' && version > LIBRARY_ARCHIVE_SCHEMA_VERSION;
    throw new AppError(
      400,
      'ARCHIVE_VERSION',
      newer
        ? `This library was written by a newer Canwright (archive version ${version}); this server reads version ${LIBRARY_ARCHIVE_SCHEMA_VERSION}. Update Canwright here, then import it. Nothing was imported.`
        : `This archive's version (${JSON.stringify(version)}) is not one Canwright knows. Nothing was imported.`,
    );
  }
  return parseFile(manifestSchema, archiveFileNames.manifest, raw);
}

/**
 * Reads and checks the whole archive (all but the photos' bytes) without writing anything: the
 * manifest, each file against its schema, each design one at a time (its documents through
 * validateDesign, its summaries from a fresh layout; the event loop gets a turn between designs),
 * and the references between files.
 */
export async function readLibraryContent(archive: ArchiveEntries): Promise<LibraryContent> {
  const manifest = await readManifest(archive);
  const designsFile = await readJson(archive, archiveFileNames.designs, designsFileSchema);
  const designs: LibraryContent['designs'] = [];
  for (const [index, raw] of designsFile.designs.entries()) {
    const design = parseFile(archivedDesignSchema, archiveFileNames.designs, raw, `designs.${index}.`);
    if (designs.some((d) => d.key === design.key)) throw refuse(`Two designs in designs.json have the key "${design.key}".`);
    designs.push({ ...design, summaries: design.versions.map((version) => summarizeDesign(version.document)) });
    await nextTurn();
  }
  const { burns } = await readJson(archive, archiveFileNames.burns, burnsFileSchema);
  const { profiles } = await readJson(archive, archiveFileNames.printerProfiles, printerProfilesFileSchema);
  const { preferences } = await readJson(archive, archiveFileNames.preferences, preferencesFileSchema);
  const content = { manifest, designs, burns, profiles, preferences };
  checkReferences(content, archive);
  return content;
}

function checkReferences(content: LibraryContent, archive: ArchiveEntries): void {
  const versionsOf = new Map(content.designs.map((d) => [d.key, d.versions.length]));
  const named = new Set<string>();
  content.burns.forEach((burn, index) => {
    const versions = versionsOf.get(burn.design);
    if (versions === undefined) throw refuse(`Burn ${index + 1} in burns.json names design "${burn.design}", which designs.json does not hold.`);
    if (burn.version > versions) throw refuse(`Burn ${index + 1} in burns.json tested version ${burn.version} of design "${burn.design}", which has ${versions} version${versions === 1 ? '' : 's'}.`);
    for (const photo of burn.photos) {
      for (const name of [photo.image, photo.thumbnail]) {
        if (!name.endsWith(`.${archivePhotoExtension[photo.contentType]}`)) throw refuse(`The photo ${name} does not end as a ${photo.contentType} file does.`);
        if (named.has(name)) throw refuse(`The photo ${name} is named twice in burns.json.`);
        if (!archive.has(name)) throw refuse(`burns.json names the photo ${name}, which the archive does not hold.`);
        named.add(name);
      }
    }
  });
  const loose = archive.names().find((name) => ARCHIVE_PHOTO_NAME.test(name) && !named.has(name));
  if (loose) throw refuse(`The archive holds the photo ${loose}, which no burn in burns.json names.`);
  const unknownDrill = content.preferences.drillSetIds?.find((id) => !findDrill(id));
  if (unknownDrill) throw refuse(`preferences.json names a drill Canwright does not know: "${unknownDrill}".`);

  const { counts } = content.manifest;
  const found = {
    designs: content.designs.length,
    versions: content.designs.reduce((sum, d) => sum + d.versions.length, 0),
    burns: content.burns.length,
    photos: content.burns.reduce((sum, b) => sum + b.photos.length, 0),
    printerProfiles: content.profiles.length,
  };
  const words = { designs: 'designs', versions: 'design versions', burns: 'burn entries', photos: 'photos', printerProfiles: 'printer profiles' };
  const differs = (Object.keys(found) as (keyof typeof found)[]).find((key) => found[key] !== counts[key]);
  if (differs) throw refuse(`The manifest counts ${counts[differs]} ${words[differs]} but the archive holds ${found[differs]}, so it is incomplete or was edited.`);
}
