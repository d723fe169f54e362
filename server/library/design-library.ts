import type { DesignRepository } from './design-repository.ts';
import { createDesignUseCases } from './design-use-cases.ts';
import { createDesignVersionUseCases } from './design-version-use-cases.ts';

/** The whole design library: designs, their versions and share links, over one repository. */
export function createDesignLibrary(designs: DesignRepository) {
  return { ...createDesignUseCases(designs), ...createDesignVersionUseCases(designs) };
}

export type DesignLibrary = ReturnType<typeof createDesignLibrary>;
