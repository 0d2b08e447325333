import { existsSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';

/** The project's seeds/ folder (SEEDS_DIR overrides). */
export function seedsDir(): string {
  return resolve(process.env.SEEDS_DIR ?? join(__dirname, '..', '..', '..', 'seeds'));
}

export function seedPath(...parts: string[]): string {
  return join(seedsDir(), ...parts);
}

/** Reads a seed JSON file; files shaped `{ _note, items }` give their items. */
export function readSeed<T>(...parts: string[]): T {
  const file = seedPath(...parts);
  if (!existsSync(file)) throw new Error(`Seed file missing: ${file}`);
  const data = JSON.parse(readFileSync(file, 'utf8')) as unknown;
  if (data && typeof data === 'object' && !Array.isArray(data) && 'items' in data) return (data as { items: T }).items;
  return data as T;
}
