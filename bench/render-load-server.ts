import { startServer } from '../server/server.ts';
import { productionLimits, type RateLimitPolicy } from '../server/http/rate-limits.ts';

/**
 * The server the render-load bench talks to, in a process of its own so the load generator does
 * not share its event loop. Rate limits are raised out of the way: one address sends thousands of
 * renders here, which is what the bench measures, not what a person does.
 */
const unlimited = Object.fromEntries(Object.keys(productionLimits).map((name) => [name, 1_000_000])) as unknown as RateLimitPolicy;
const server = await startServer({ database: { kind: 'memory' }, port: 0, host: '127.0.0.1', seedDemo: false, quiet: true, rateLimits: unlimited });
console.log(`LISTENING ${server.url}`);
process.on('SIGTERM', () => void server.close().then(() => process.exit(0)));
