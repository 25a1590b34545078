import { QueryTypes } from 'sequelize';
import type { Database } from '../db/database';
import type { Viewer } from './setupAccess';
import { findViewableSetup } from './setupAccess';

export type FamilyNode = {
  id: number;
  parentId: number | null;
  depth: number;
  /** False for setups the viewer may not open (private, deleted or hidden); details are withheld. */
  visible: boolean;
  title: string | null;
  ownerHandle: string | null;
  createdAt: string;
  /** Fields in which this setup's current sheet differs from the parent revision it was forked from. */
  changedFromParent: number | null;
};

export type Family = { ancestors: FamilyNode[]; descendants: FamilyNode[]; forkCount: number; familyForkCount: number };

const NODE_COLUMNS = `
  s.id, s.forked_from_setup_id AS "parentId", s.created_at AS "createdAt", s.owner_id AS "ownerId",
  s.visibility, s.hidden_at AS "hiddenAt", s.deleted_at AS "deletedAt", s.title, u.handle AS "ownerHandle",
  (SELECT count(*)::int FROM jsonb_each(cur.values) c FULL JOIN jsonb_each(src.values) p USING (key)
     WHERE c.value IS DISTINCT FROM p.value) AS "changedFromParent"`;

const NODE_JOINS = `
  JOIN users u ON u.id = s.owner_id
  JOIN setup_revisions cur ON cur.id = s.current_revision_id
  LEFT JOIN setup_revisions src ON src.id = s.forked_from_revision_id`;

type Row = Omit<FamilyNode, 'visible' | 'depth' | 'createdAt'> & {
  depth: number;
  createdAt: Date;
  ownerId: number;
  visibility: string;
  hiddenAt: Date | null;
  deletedAt: Date | null;
};

function toNode(row: Row, viewer: Viewer): FamilyNode {
  const visible = !row.deletedAt && !row.hiddenAt && (row.visibility === 'public' || row.ownerId === viewer?.id);
  return {
    id: row.id,
    parentId: row.parentId,
    depth: row.depth,
    visible,
    title: visible ? row.title : null,
    ownerHandle: visible ? row.ownerHandle : null,
    createdAt: row.createdAt.toISOString(),
    changedFromParent: row.parentId === null ? null : row.changedFromParent,
  };
}

/**
 * A setup's lineage: the chain of originals up to the root and the tree of forks below it, each
 * read with one recursive query whatever the family's size.
 */
export async function getFamily(db: Database, setupId: number, viewer: Viewer, share?: string): Promise<Family> {
  const setup = await findViewableSetup(db, setupId, viewer, share);
  const ancestors = await db.sequelize.query<Row>(
    `WITH RECURSIVE up(id, depth) AS (
       SELECT forked_from_setup_id, 1 FROM setups WHERE id = :id AND forked_from_setup_id IS NOT NULL
       UNION ALL
       SELECT s.forked_from_setup_id, up.depth + 1 FROM setups s JOIN up ON s.id = up.id
        WHERE s.forked_from_setup_id IS NOT NULL AND up.depth < 10000
     )
     SELECT ${NODE_COLUMNS}, -up.depth AS depth FROM up JOIN setups s ON s.id = up.id ${NODE_JOINS}
     ORDER BY up.depth DESC`,
    { replacements: { id: setup.id }, type: QueryTypes.SELECT },
  );
  const descendants = await db.sequelize.query<Row>(
    `WITH RECURSIVE down(id, depth) AS (
       SELECT id, 1 FROM setups WHERE forked_from_setup_id = :id
       UNION ALL
       SELECT s.id, down.depth + 1 FROM setups s JOIN down ON s.forked_from_setup_id = down.id WHERE down.depth < 10000
     )
     SELECT ${NODE_COLUMNS}, down.depth AS depth FROM down JOIN setups s ON s.id = down.id ${NODE_JOINS}
     ORDER BY down.depth, s.created_at, s.id`,
    { replacements: { id: setup.id }, type: QueryTypes.SELECT },
  );
  const rootId = setup.familyRootId ?? setup.id;
  const [counts] = await db.sequelize.query<{ forkCount: number; familyForkCount: number }>(
    `SELECT (SELECT count(*)::int FROM setups WHERE forked_from_setup_id = :id AND deleted_at IS NULL AND hidden_at IS NULL) AS "forkCount",
            (SELECT count(*)::int FROM setups WHERE family_root_id = :root AND deleted_at IS NULL AND hidden_at IS NULL) AS "familyForkCount"`,
    { replacements: { id: setup.id, root: rootId }, type: QueryTypes.SELECT },
  );
  return {
    ancestors: ancestors.map((r) => toNode(r, viewer)),
    descendants: descendants.map((r) => toNode(r, viewer)),
    forkCount: counts.forkCount,
    familyForkCount: counts.familyForkCount,
  };
}
