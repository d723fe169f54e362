import type { DesignRepository } from './design-repository.ts';
import { createDesignUseCases, type DesignFiles } from './design-use-cases.ts';
import { createDesignVersionUseCases } from './design-version-use-cases.ts';

/** The whole design library: designs, their versions and share links, over one repository. */
export function createDesignLibrary(designs: DesignRepository, files?: DesignFiles) {
  return { ...createDesignUseCases(designs, files), ...createDesignVersionUseCases(designs) };
}

export type DesignLibrary = ReturnType<typeof createDesignLibrary>;
