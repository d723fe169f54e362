import type { DesignInput } from '../../../shared/design/design-schema.ts';
import { validateDesign } from '../../../shared/design/validate-design.ts';
import { draftStore, type StartOptions } from './draft-store.ts';

/**
 * Every way into the design screen goes through here: an example, a library design, a shared
 * copy, a file, a blank design. The document is filled out with the schema's defaults (so the
 * form has every field to show), and edited work on screen is put aside, never lost.
 */
export function openDesign(document: DesignInput, options: StartOptions): void {
  const valid = validateDesign(document);
  draftStore.start(structuredClone(valid.ok ? (valid.design as DesignInput) : document), options);
}
