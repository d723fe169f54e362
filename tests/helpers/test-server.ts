
import { fileURLToPath } from 'node:url';
import { startServer, type RunningServer, type ServerOptions } from '../../server/server.ts';
import { createTestDatabase } from './test-database.ts';

export const clientDir = fileURLToPath(new URL('../../dist/client', import.meta.url));

export interface TestServer extends RunningServer {
  mail: NonNullable<RunningServer['mail']>;
}

/** The whole app in this process on a free loopback port, a fresh database and captured mail. */
export async function startTestServer(options: Partial<ServerOptions> = {}): Promise<TestServer> {
  const database = await createTestDatabase();
  const server = await startServer({ database: database.target, port: 0, host: '127.0.0.1', seedDemo: false, quiet: true, ...options });
  if (!server.mail) throw new Error('test servers capture mail locally');
  return {
    ...server,
    mail: server.mail,
    async close() {
      await server.close();
      await database.drop();
    },
  };
}

