// zod's core: schemas of the full build and of zod/mini both pass, and the entry chunk (which
// checks the session) carries only the core's parser, not the whole of zod.
import { safeParse, type $ZodType, type output } from 'zod/v4/core';

export interface FieldProblem {
  path: string;
  message: string;
}

/** An error answer from the API: status, stable code, message and, for 400s, the bad fields. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: FieldProblem[] = [],
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

interface RequestOptions {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  body?: unknown;
  signal?: AbortSignal;
}

/** Calls the API and checks the answer against a zod schema. */
export async function apiRequest<S extends $ZodType>(path: string, schema: S, options: RequestOptions = {}): Promise<output<S>> {
  const response = await fetch(path, {
    method: options.method ?? 'GET',
    headers: options.body === undefined ? { Accept: 'application/json' } : { Accept: 'application/json', 'Content-Type': 'application/json' },
    body: options.body === undefined ? undefined : JSON.stringify(options.body),
    credentials: 'same-origin',
    signal: options.signal,
  });
  return readAnswer(response, path, schema);
}

/** Turns an answer into the schema's value, or an ApiError in the person's words. */
async function readAnswer<S extends $ZodType>(response: Response, path: string, schema: S): Promise<output<S>> {
  const payload: unknown = await response.json().catch(() => undefined);
  if (!response.ok) {
    const error = (payload as { error?: { code?: string; message?: string; details?: { fields?: FieldProblem[] } } } | undefined)?.error;
    throw new ApiError(response.status, error?.code ?? 'HTTP_' + response.status, error?.message ?? `The server answered ${response.status}.`, error?.details?.fields ?? []);
  }
  const parsed = safeParse(schema, payload);
  if (parsed.success) return parsed.data;
  // A proxy's page or a server of another version: say so plainly, never the checker's own words.
  console.error(`Unexpected answer from ${path}`, parsed.error.issues);
  throw new ApiError(response.status, 'UNEXPECTED_ANSWER', 'The server sent an answer this page does not understand. Reload the page; if it keeps happening, the server may be updating.');
}

/**
 * fetch, asking again when the server says it is busy (503 or 429 with a short Retry-After), as a
 * person would after a moment; after the last try the busy answer is returned as it came.
 */
export async function fetchRetryingWhenBusy(
  input: string,
  init: RequestInit,
  { tries = 3, longestWaitSeconds = 10, sleep = (ms: number) => new Promise<void>((resolve) => setTimeout(resolve, ms)) } = {},
): Promise<Response> {
  for (let attempt = 1; ; attempt++) {
    const response = await fetch(input, init);
    const wait = Number(response.headers.get('retry-after'));
    const busy = (response.status === 503 || response.status === 429) && Number.isFinite(wait) && wait > 0 && wait <= longestWaitSeconds;
    if (!busy || attempt >= tries || init.signal?.aborted) return response;
    await sleep(wait * 1000);
  }
}

/** Sends one file as multipart form data (the browser sets the boundary), with any text fields before it, and checks the answer. */
export async function apiUpload<S extends $ZodType>(path: string, schema: S, field: string, file: Blob, fileName: string, fields: Record<string, string> = {}): Promise<output<S>> {
  const form = new FormData();
  for (const [name, value] of Object.entries(fields)) form.append(name, value);
  form.append(field, file, fileName);
  const response = await fetch(path, { method: 'POST', body: form, credentials: 'same-origin', headers: { Accept: 'application/json' } });
  return readAnswer(response, path, schema);
}
