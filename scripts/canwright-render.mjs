#!/usr/bin/env node
// The `canwright-render` command (package.json bin): the render CLI, run through tsx.
import { register } from 'tsx/esm/api';

register();
await import('../server/cli/render-cli.ts');
