import type { NextFunction, Request, Response } from 'express';

const NUL = '\u0000';

/** The dotted path of the first string (value or key) holding U+0000, or null. */
function findNul(value: unknown, path: string, depth = 0): string | null {
  if (typeof value === 'string') return value.includes(NUL) ? path || 'body' : null;
  if (depth > 32 || value === null || typeof value !== 'object') return null;
  for (const [key, v] of Object.entries(value as Record<string, unknown>)) {
    const here = path ? `${path}.${key === '' ? '(empty name)' : key}` : key === '' ? '(empty name)' : key;
    if (key.includes(NUL)) return here;
    const found = findNul(v, here, depth + 1);
    if (found) return found;
  }
  return null;
}

function refuse(res: Response, field: string): void {
  res.status(400).json({
    statusCode: 400,
    error: 'Bad Request',
    message: `${field}: must not contain the NUL character (U+0000)`,
    errors: [{ field, message: 'must not contain the NUL character (U+0000)' }],
  });
}

/**
 * PostgreSQL text cannot hold U+0000 (SQLite can), so a NUL in a path, query or JSON body would
 * reach the database as an error on one engine and not the other. No field of this API means a
 * NUL, so it is refused up front, the same on both engines: 400 naming the field.
 */
export function refuseNul(req: Request, res: Response, next: NextFunction): void {
  const pathPart = (req.originalUrl ?? req.url ?? '').split('?')[0];
  if (/%00/i.test(pathPart) || pathPart.includes(NUL)) return refuse(res, 'path');
  const inQuery = findNul(req.query, '');
  if (inQuery) return refuse(res, inQuery);
  const inBody = findNul(req.body, '');
  if (inBody) return refuse(res, inBody);
  next();
}
