import bcrypt from 'bcryptjs';

/** bcrypt hash at the configured cost (≥ 10 outside tests). */
export function hashPassword(password: string, cost: number): Promise<string> {
  return bcrypt.hash(password, cost);
}

/**
 * Compares in constant time for a given hash. When there is no hash (unknown account or GitHub-only
 * account) a dummy comparison still runs so the answer takes about as long as a real one.
 */
export async function verifyPassword(password: string, hash: string | null, cost: number): Promise<boolean> {
  if (!hash) {
    await bcrypt.compare(password, dummyHash(cost));
    return false;
  }
  return bcrypt.compare(password, hash);
}

const dummyHashes = new Map<number, string>();
function dummyHash(cost: number): string {
  let hash = dummyHashes.get(cost);
  if (!hash) {
    hash = bcrypt.hashSync('tunefork-timing-equaliser', cost);
    dummyHashes.set(cost, hash);
  }
  return hash;
}
