// `npm start`: install what is missing, then run the server (TypeScript, through tsx) in this process.
import { fileURLToPath } from 'node:url';
import { ensureDependencies } from './ensure-deps.mjs';

const root = fileURLToPath(new URL('..', import.meta.url));
ensureDependencies(root);
const { register } = await import('tsx/esm/api');
register();
await import('../server/main.ts');
