/**
 * The search result stored with a redesign revision (Redesign.search), so a page view reads it instead of
 * searching again. Written once per request change (and refreshed at approval); format-tagged so a damaged
 * or foreign value is refused rather than misread.
 */
import type { RedesignSearch } from '@/lib/engine/redesign/types';

export const STORED_SEARCH_FORMAT = 'coilwright.redesign-search';
export const STORED_SEARCH_VERSION = 1;
/** Candidates kept with the revision: the screen shows a dozen, a careful engineer looks at a few dozen more. */
export const STORED_CANDIDATES_MAX = 300;

export interface StoredSearch {
  format: typeof STORED_SEARCH_FORMAT;
  version: typeof STORED_SEARCH_VERSION;
  /** Sheet revision the search ran on. */
  sheetRevision: number;
  /** How many candidates the search found (the stored list may hold fewer). */
  candidatesFound: number;
  search: RedesignSearch;
}

/** The value to store: the search with its candidate list cut to STORED_CANDIDATES_MAX. */
export function toStoredSearch(search: RedesignSearch, sheetRevision: number): StoredSearch {
  return {
    format: STORED_SEARCH_FORMAT,
    version: STORED_SEARCH_VERSION,
    sheetRevision,
    candidatesFound: search.candidates.length,
    search: { ...search, candidates: search.candidates.slice(0, STORED_CANDIDATES_MAX) },
  };
}

/** A stored value is a search only if it says so and carries the fields the screens read. */
export function isStoredSearch(v: unknown): v is StoredSearch {
  if (typeof v !== 'object' || v === null) return false;
  const s = v as Record<string, unknown>;
  const search = s.search as Record<string, unknown> | null | undefined;
  return (
    s.format === STORED_SEARCH_FORMAT &&
    s.version === STORED_SEARCH_VERSION &&
    typeof search === 'object' &&
    search !== null &&
    Array.isArray(search.candidates) &&
    Array.isArray(search.rejected) &&
    typeof search.asFound === 'object'
  );
}
