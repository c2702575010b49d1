import { problemSchema, type Problem } from '@chuckkey/core';
import type { z } from 'zod';

export class ApiError extends Error {
  readonly status: number;
  readonly problem: Problem | null;

  constructor(status: number, problem: Problem | null) {
    super(problem?.detail ?? problem?.title ?? `The server answered ${status}.`);
    this.name = 'ApiError';
    this.status = status;
    this.problem = problem;
  }
}

async function readProblem(response: Response): Promise<Problem | null> {
  try {
    const parsed = problemSchema.safeParse(await response.json());
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

/**
 * Every answer is checked against core's schema, so a server and a kiosk of different
 * versions fail loudly on the screen's error state instead of showing half a page.
 */
export async function apiGet<T extends z.ZodType>(path: string, schema: T, signal?: AbortSignal): Promise<z.infer<T>> {
  const response = await fetch(`/api${path}`, {
    credentials: 'same-origin',
    headers: { accept: 'application/json' },
    signal,
  });
  if (!response.ok) throw new ApiError(response.status, await readProblem(response));
  return schema.parse(await response.json());
}
