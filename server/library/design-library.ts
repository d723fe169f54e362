import type { DesignRepository } from './design-repository.ts';
import { createDesignUseCases, type DesignFiles, type DesignUses } from './design-use-cases.ts';
import { createDesignVersionUseCases } from './design-version-use-cases.ts';

/** The whole design library: designs, their versions and share links, over one repository. */
export function createDesignLibrary(designs: DesignRepository, files?: DesignFiles, uses?: DesignUses) {
  return { ...createDesignUseCases(designs, files, uses), ...createDesignVersionUseCases(designs) };
}

export type DesignLibrary = ReturnType<typeof createDesignLibrary>;
