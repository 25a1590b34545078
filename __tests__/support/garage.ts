import type { Database } from '../../server/db/database';
import { seedDemoWorld } from '../../server/seeders';
import type { SessionAgent } from './accounts';

/** Makes sure the demo catalogue (kits with stock sheets) exists; idempotent. */
export async function ensureCatalog(db: Database): Promise<void> {
  if ((await db.models.Kit.count()) === 0) await seedDemoWorld(db, { bcryptCost: 4 });
}

export async function kitId(db: Database, slug: string): Promise<number> {
  const kit = await db.models.Kit.findOne({ where: { slug } });
  if (!kit) throw new Error(`no kit ${slug}`);
  return kit.id;
}

/** Creates a car through the API and a setup on it from the kit's stock sheet. */
export async function carWithStockSetup(
  s: SessionAgent,
  kit: number,
  setup: { title?: string; visibility?: 'private' | 'unlisted' | 'public' } = {},
) {
  const car = await s.agent.post('/api/cars').set('X-CSRF-Token', s.csrf).send({ kitId: kit, nickname: 'Test car' }).expect(201);
  const created = await s.agent
    .post('/api/setups')
    .set('X-CSRF-Token', s.csrf)
    .send({ carId: car.body.car.id, title: setup.title ?? 'Test setup', visibility: setup.visibility ?? 'private', startFrom: { kind: 'stock' } })
    .expect(201);
  return { carId: car.body.car.id as number, setup: created.body.setup as { id: number; shareToken: string | null; currentRevision: { id: number; number: number; values: Record<string, unknown> } } };
}
