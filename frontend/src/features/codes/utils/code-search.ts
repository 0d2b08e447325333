import { parseDtc, type CodeIndexEntry } from '@causeway/shared';
import Fuse from 'fuse.js';

export type CodeSearch = (query: string, limit?: number) => CodeIndexEntry[];

/** One entry per code and make. */
export function entryKey(entry: Pick<CodeIndexEntry, 'code' | 'make'>): string {
  return `${entry.code}|${entry.make ?? ''}`;
}

const CODE_PREFIX = /^[PCBU][0-3O][0-9A-FO]{0,3}$/;

/** 'po4' → 'P04': a code being typed, letter O read as zero after the first character. */
function codePrefix(query: string): string | null {
  const compact = query.toUpperCase().replace(/\s+/g, '');
  if (compact.length < 2 || !CODE_PREFIX.test(compact)) return null;
  return compact[0] + compact.slice(1).replace(/O/g, '0');
}

/**
 * An instant search over the catalogue index. A whole code (as typed or read off a scan tool)
 * comes first; a code being typed ("P04") lists the codes it starts; anything else is matched
 * word by word, fuzzily, against the title, code, subsystem and symptoms.
 */
export function createCodeSearch(index: readonly CodeIndexEntry[]): CodeSearch {
  const options = {
    keys: [
      { name: 'code', weight: 3 },
      { name: 'title', weight: 2 },
      { name: 'subsystem', weight: 1 },
      { name: 'symptoms', weight: 1 },
    ],
    useTokenSearch: true,
    ignoreLocation: true,
    threshold: 0.35,
  };
  // Every word must match, so "very small leak" does not drift to "overtemp"; when nothing
  // matches every word, entries matching some of them are better than nothing.
  const everyWord = new Fuse(index, { ...options, tokenMatch: 'all' });
  const someWords = new Fuse(index, { ...options, tokenMatch: 'any' });

  return (query, limit = 8) => {
    const text = query.trim();
    if (!text) return [];
    const found: CodeIndexEntry[] = [];
    const seen = new Set<string>();
    const add = (entry: CodeIndexEntry) => {
      const key = entryKey(entry);
      if (seen.has(key) || found.length >= limit) return;
      seen.add(key);
      found.push(entry);
    };

    const parsed = parseDtc(text);
    if (parsed.ok) {
      index.filter((e) => e.code === parsed.value.code).forEach(add);
    } else {
      const prefix = codePrefix(text);
      if (prefix) {
        index.filter((e) => e.code.startsWith(prefix)).forEach(add);
        return found;
      }
    }
    const before = found.length;
    for (const result of everyWord.search(text, { limit: limit + before })) add(result.item);
    if (found.length === before) for (const result of someWords.search(text, { limit: limit + before })) add(result.item);
    return found;
  };
}
