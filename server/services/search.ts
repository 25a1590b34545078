import { QueryTypes } from 'sequelize';
import { DISCOVER_PAGE_SIZE, searchQuerySchema, type KitSuggestion, type SearchPage } from '../../shared/types/community';
import type { Database } from '../db/database';
import { CARD_COLUMNS_SQL, CARD_FROM_SQL, LISTED_SQL, cursorSchemas, decodeCursor, encodeCursor, parseQuery, toCard, type CardRow } from './discover';

/*
 * Full-text search over listed setups: the generated `search_document` column (title A, notes B,
 * kit, maker and handle C; see migration 20261202T0800-votes-and-search) through its GIN index.
 * websearch_to_tsquery reads what people type — "quoted phrases", -without, or — and never raises
 * a syntax error, so nonsense finds nothing instead of failing. The words reach SQL as literals,
 * so the planner sees the real query and picks the index or a newest-first walk as fits.
 */

/** How close a kit name must be to the words (pg_trgm word similarity, 0–1) to be offered. */
const KIT_SIMILARITY = 0.4;
const KIT_SUGGESTIONS = 3;
/**
 * Ranking reads every match's document, so a common word ("dusty" in a fifth of 100,000 setups)
 * would cost hundreds of milliseconds. Matches are ranked among the newest this many instead: a
 * rare word is ranked over all its matches, a common one over its most recent ones (13 pages of
 * results). At 1,000 the generated 100,000-setup world spent about 40 ms per common-word query
 * collecting candidates; 250 keeps the answer fresh and the cost a quarter of that.
 */
export const RANKED_CANDIDATES = 250;

/**
 * What reaches PostgreSQL: NUL is the one character a text value cannot hold, and "@" starts a
 * handle in the app ("@juno_braithwick") but is not part of the handle.
 */
function cleanQuery(q: string): string {
  return q.replace(/\u0000/g, ' ').replace(/(^|\s)@(?=\S)/g, '$1').trim();
}

type RankedRow = CardRow & { rank: string };

async function matchingSetups(db: Database, q: string, cursor: string | undefined, limit: number) {
  const params: Record<string, unknown> = { q, limit: limit + 1, candidates: RANKED_CANDIDATES };
  let after = '';
  if (cursor) {
    const key = decodeCursor(cursorSchemas.search, cursor);
    // Ranks are real (float4) and compared as real: the cursor carries the exact printed value.
    after = 'WHERE (ranked.rank, ranked.id) < (:afterRank::real, :afterId)';
    Object.assign(params, { afterRank: key.r, afterId: key.id });
  }
  // A query of nothing but -words (querytree 'T') would list every setup without them: it needs a
  // word to look for. Normalisation 32 maps the rank into [0, 1), which the cursor checks.
  const rows = await db.sequelize.query<RankedRow>(
    `WITH candidates AS (
       SELECT s.id FROM setups s JOIN users u ON u.id = s.owner_id
        WHERE querytree(websearch_to_tsquery('english', :q)) <> 'T'
          AND s.search_document @@ websearch_to_tsquery('english', :q) AND ${LISTED_SQL}
        ORDER BY s.id DESC LIMIT :candidates),
     ranked AS (
       SELECT s.id, ts_rank_cd(s.search_document, websearch_to_tsquery('english', :q), 32) AS rank
         FROM candidates JOIN setups s ON s.id = candidates.id)
     SELECT ${CARD_COLUMNS_SQL}, ranked.rank::text AS rank
       FROM ranked JOIN ${CARD_FROM_SQL} ON s.id = ranked.id
       ${after}
      ORDER BY ranked.rank DESC, ranked.id DESC
      LIMIT :limit`,
    { replacements: params, type: QueryTypes.SELECT },
  );
  const page = rows.slice(0, limit);
  const last = page[page.length - 1];
  return {
    setups: page.map((r) => toCard(r)),
    nextCursor: rows.length > limit ? encodeCursor({ o: 'search', r: Number(last.rank), id: last.id }) : null,
  };
}

/** Kits whose name is close to the words typed or to part of them, typos and all ("stot 8e" → Stoat 8E). */
async function similarKits(db: Database, q: string): Promise<KitSuggestion[]> {
  if (q.length < 3) return [];
  return db.sequelize.query<KitSuggestion>(
    `SELECT id, name, "makerName", "vehicleClass" FROM (
       SELECT k.id, k.name, m.name AS "makerName", k.vehicle_class AS "vehicleClass",
              greatest(word_similarity(k.name, :q), word_similarity(:q, k.name)) AS score
         FROM kits k JOIN makers m ON m.id = k.maker_id) scored
      WHERE score >= :threshold
      ORDER BY score DESC, name ASC
      LIMIT :limit`,
    { replacements: { q, threshold: KIT_SIMILARITY, limit: KIT_SUGGESTIONS }, type: QueryTypes.SELECT },
  );
}

/**
 * `GET /api/search?q=`: listed setups matching the words, best match first (cover density rank,
 * title above notes above names), a page at a time; and, on the first page, kits whose names are
 * close to the words. Empty or nonsense words give an empty list.
 */
export async function searchSetups(db: Database, query: unknown, limit = DISCOVER_PAGE_SIZE): Promise<SearchPage> {
  const { q, cursor } = parseQuery(searchQuerySchema, query);
  const words = cleanQuery(q);
  if (!words) return { setups: [], nextCursor: null, kitSuggestions: [] };
  const [matches, kitSuggestions] = await Promise.all([matchingSetups(db, words, cursor, limit), cursor ? Promise.resolve([]) : similarKits(db, words)]);
  return { ...matches, kitSuggestions };
}
