import request from 'supertest';
import type { CommentDto } from '../../shared/types/forks';
import { fieldsByKey, getTemplate } from '../../shared/types/templates';
import { countVisibleComments } from '../../server/services/comments';
import { createRacer, csrfAgent, signIn, type SessionAgent } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { buildTestApp, type TestApp } from '../support/testApp';

let t: TestApp;
let owner: SessionAgent;
let other: SessionAgent;
let moderator: SessionAgent;
let ownerHandle: string;
let otherHandle: string;
let stoat8n: number;

beforeAll(async () => {
  t = buildTestApp();
  await ensureCatalog(t.db);
  stoat8n = await kitId(t.db, 'ottervale-stoat-8n');
  const a = await createRacer(t.db);
  const b = await createRacer(t.db);
  const m = await createRacer(t.db, { role: 'moderator' });
  owner = await signIn(t.app, a.handle, a.password);
  other = await signIn(t.app, b.handle, b.password);
  moderator = await signIn(t.app, m.handle, m.password);
  ownerHandle = a.handle;
  otherHandle = b.handle;
});
afterAll(async () => {
  await t.close();
});

function post(s: SessionAgent, setupId: number, body: object) {
  return s.agent.post(`/api/setups/${setupId}/comments`).set('X-CSRF-Token', s.csrf).send(body);
}
function edit(s: SessionAgent, commentId: number, body: object) {
  return s.agent.patch(`/api/comments/${commentId}`).set('X-CSRF-Token', s.csrf).send(body);
}
function remove(s: SessionAgent, commentId: number) {
  return s.agent.delete(`/api/comments/${commentId}`).set('X-CSRF-Token', s.csrf);
}
async function thread(s: SessionAgent | null, setupId: number, share?: string): Promise<CommentDto[]> {
  const url = `/api/setups/${setupId}/comments${share ? `?share=${share}` : ''}`;
  const res = await (s ? s.agent.get(url) : request(t.app).get(url)).expect(200);
  return res.body.comments;
}

/** A setup with a second revision that changes the rear shock oil only. */
async function setupWithChange(visibility: 'private' | 'unlisted' | 'public' = 'public') {
  const { setup } = await carWithStockSetup(owner, stoat8n, { visibility });
  const before = setup.currentRevision.values as Record<string, number>;
  const saved = await owner.agent
    .post(`/api/setups/${setup.id}/revisions`)
    .set('X-CSRF-Token', owner.csrf)
    .send({ baseRevisionId: setup.currentRevision.id, values: { ...before, 'shock.rear.oil': before['shock.rear.oil'] + 50 }, changeNote: 'Thicker rear oil for the ruts.' })
    .expect(201);
  return { setup, firstRevisionId: setup.currentRevision.id, changeId: saved.body.setup.currentRevision.id as number };
}

describe('who can read and post comments', () => {
  it('lets anyone read a public setup’s comments but only signed-in racers post', async () => {
    const { setup } = await setupWithChange();
    await post(other, setup.id, { bodyMarkdown: 'How does it land off the big double?' }).expect(201);
    const read = await thread(null, setup.id);
    expect(read.map((c) => c.author.handle)).toEqual([otherHandle]);
    const anonymous = await csrfAgent(t.app);
    const refused = await post(anonymous, setup.id, { bodyMarkdown: 'Anonymous question' });
    expect(refused.status).toBe(401);
    expect(await countVisibleComments(t.db, setup.id)).toBe(1);
  });

  it('keeps a private setup’s comments invisible to everyone but its owner', async () => {
    const { setup } = await setupWithChange('private');
    await post(owner, setup.id, { bodyMarkdown: 'Note to self: try 500 next week.' }).expect(201);
    expect(await thread(owner, setup.id)).toHaveLength(1);
    await other.agent.get(`/api/setups/${setup.id}/comments`).expect(404);
    await request(t.app).get(`/api/setups/${setup.id}/comments`).expect(404);
    const refused = await post(other, setup.id, { bodyMarkdown: 'Peeking in' });
    expect(refused.status).toBe(404);
    expect(await countVisibleComments(t.db, setup.id)).toBe(1);
  });

  it('opens an unlisted setup’s comments to the share link only', async () => {
    const { setup } = await setupWithChange('unlisted');
    const share = setup.shareToken!;
    await other.agent.get(`/api/setups/${setup.id}/comments`).expect(404);
    expect((await post(other, setup.id, { bodyMarkdown: 'No link' })).status).toBe(404);
    const created = await post(other, setup.id, { bodyMarkdown: 'Got the link from the pits.', share });
    expect(created.status).toBe(201);
    expect((await thread(other, setup.id, share)).map((c) => c.id)).toEqual([created.body.comment.id]);
    expect(await thread(null, setup.id, share)).toHaveLength(1);
  });
});

describe('what a comment is about', () => {
  it('comments on the setup as a whole', async () => {
    const { setup } = await setupWithChange();
    const res = await post(other, setup.id, { bodyMarkdown: 'Nice and tidy sheet.' });
    expect(res.status).toBe(201);
    expect(res.body.comment).toMatchObject({ setupId: setup.id, revisionId: null, revisionNumber: null, fieldKey: null, fieldLabel: null, parentId: null });
    expect(res.body.comment.author).toMatchObject({ handle: otherHandle });
  });

  it('comments on one change, naming its revision number', async () => {
    const { setup, changeId } = await setupWithChange();
    const res = await post(other, setup.id, { bodyMarkdown: 'Did it settle the rear?', revisionId: changeId });
    expect(res.status).toBe(201);
    expect(res.body.comment).toMatchObject({ revisionId: changeId, revisionNumber: 2, fieldKey: null });
  });

  it('comments on a field the change touched, with the label of the class’s sheet', async () => {
    const { setup, changeId } = await setupWithChange();
    const res = await post(other, setup.id, { bodyMarkdown: 'Why 50 cSt more at the rear?', revisionId: changeId, fieldKey: 'shock.rear.oil' });
    expect(res.status).toBe(201);
    const label = fieldsByKey(getTemplate('buggy-1-8-nitro')).get('shock.rear.oil')!.label;
    expect(res.body.comment).toMatchObject({ revisionNumber: 2, fieldKey: 'shock.rear.oil', fieldLabel: label });
    const [listed] = await thread(null, setup.id);
    expect(listed).toMatchObject({ fieldKey: 'shock.rear.oil', fieldLabel: label, revisionNumber: 2 });
  });

  it('accepts any field of the sheet on the first revision, which sets the whole sheet', async () => {
    const { setup, firstRevisionId } = await setupWithChange();
    const res = await post(other, setup.id, { bodyMarkdown: 'Stock front diff?', revisionId: firstRevisionId, fieldKey: 'diff.front.oil' });
    expect(res.status).toBe(201);
    expect(res.body.comment).toMatchObject({ revisionNumber: 1, fieldKey: 'diff.front.oil' });
  });

  it('refuses a revision of another setup, a field the change did not touch, an unknown field and a field without a change', async () => {
    const { setup, changeId, firstRevisionId } = await setupWithChange();
    const elsewhere = await setupWithChange();
    const foreign = await post(other, setup.id, { bodyMarkdown: 'Wrong setup', revisionId: elsewhere.changeId });
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.details.revisionId).toBe('That change is not part of this setup.');

    const untouched = await post(other, setup.id, { bodyMarkdown: 'Front diff?', revisionId: changeId, fieldKey: 'diff.front.oil' });
    expect(untouched.status).toBe(400);
    expect(untouched.body.error.details.fieldKey).toMatch(/did not change in revision 2/);

    const unknown = await post(other, setup.id, { bodyMarkdown: 'Wing colour?', revisionId: firstRevisionId, fieldKey: 'wing.colour' });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.details.fieldKey).toMatch(/not a field of this class's sheet/);

    const loose = await post(other, setup.id, { bodyMarkdown: 'Rear oil?', fieldKey: 'shock.rear.oil' });
    expect(loose.status).toBe(400);
    expect(loose.body.error.details.fieldKey).toBe('Pick the change this field belongs to.');

    expect(await countVisibleComments(t.db, setup.id)).toBe(0);
  });
});

describe('threads', () => {
  it('nests replies under the comment they answer, oldest first, on the same change and field', async () => {
    const { setup, changeId } = await setupWithChange();
    const first = (await post(other, setup.id, { bodyMarkdown: 'Why thicker?', revisionId: changeId, fieldKey: 'shock.rear.oil' }).expect(201)).body.comment;
    const second = (await post(other, setup.id, { bodyMarkdown: 'Also: tires?' }).expect(201)).body.comment;
    const replyA = await post(owner, setup.id, { bodyMarkdown: 'The ruts were bottoming it out.', parentId: first.id });
    expect(replyA.status).toBe(201);
    expect(replyA.body.comment).toMatchObject({ parentId: first.id, revisionId: changeId, revisionNumber: 2, fieldKey: 'shock.rear.oil' });
    const replyB = await post(other, setup.id, { bodyMarkdown: 'Makes sense, thanks.', parentId: first.id }).expect(201);

    const comments = await thread(null, setup.id);
    expect(comments.map((c) => c.id)).toEqual([first.id, second.id]);
    expect(comments[0].replies.map((c) => c.id)).toEqual([replyA.body.comment.id, replyB.body.comment.id]);
    expect(comments[1].replies).toEqual([]);
  });

  it('refuses a reply to a reply, and a reply to another setup’s comment', async () => {
    const { setup } = await setupWithChange();
    const top = (await post(other, setup.id, { bodyMarkdown: 'Question' }).expect(201)).body.comment;
    const reply = (await post(owner, setup.id, { bodyMarkdown: 'Answer', parentId: top.id }).expect(201)).body.comment;
    const nested = await post(other, setup.id, { bodyMarkdown: 'Follow-up', parentId: reply.id });
    expect(nested.status).toBe(400);
    expect(nested.body.error.message).toBe('Reply to the first comment of the thread.');
    expect(nested.body.error.details.parentId).toBe('Reply to the first comment of the thread.');

    const elsewhere = await setupWithChange();
    const foreign = await post(other, elsewhere.setup.id, { bodyMarkdown: 'Cross-post', parentId: top.id });
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.details.parentId).toBe('That comment is not on this setup.');
    expect(await countVisibleComments(t.db, setup.id)).toBe(2);
  });

  it('refuses a reply that names a different change from its thread', async () => {
    const { setup, changeId, firstRevisionId } = await setupWithChange();
    const top = (await post(other, setup.id, { bodyMarkdown: 'On the change', revisionId: changeId }).expect(201)).body.comment;
    const res = await post(owner, setup.id, { bodyMarkdown: 'Answer', parentId: top.id, revisionId: firstRevisionId });
    expect(res.status).toBe(400);
    expect(res.body.error.details.revisionId).toMatch(/same change/);
  });
});

describe('the comment body', () => {
  it('refuses an empty comment and one over 5,000 characters with the contract’s messages, and accepts 5,000', async () => {
    const { setup } = await setupWithChange();
    for (const body of ['', '   \n  ']) {
      const res = await post(other, setup.id, { bodyMarkdown: body });
      expect(res.status).toBe(400);
      expect(res.body.error.message).toBe('Write something before posting.');
      expect(res.body.error.details.bodyMarkdown).toBe('Write something before posting.');
    }
    const tooLong = await post(other, setup.id, { bodyMarkdown: 'a'.repeat(5_001) });
    expect(tooLong.status).toBe(400);
    expect(tooLong.body.error.details.bodyMarkdown).toBe('Comments are at most 5,000 characters.');
    expect(await countVisibleComments(t.db, setup.id)).toBe(0);

    const longest = await post(other, setup.id, { bodyMarkdown: 'a'.repeat(5_000) });
    expect(longest.status).toBe(201);
    expect(longest.body.comment.bodyMarkdown).toHaveLength(5_000);
  });

  it('renders markdown the way setup notes do: formatting kept, scripts and javascript: links removed', async () => {
    const { setup } = await setupWithChange();
    const body = '**450 cSt** at the rear <script>alert("x")</script> and [click](javascript:alert(1)) or [the rules](https://rules.example/oil)';
    const res = await post(other, setup.id, { bodyMarkdown: body }).expect(201);
    const html: string = res.body.comment.bodyHtml;
    expect(html).toContain('<strong>450 cSt</strong>');
    expect(html).not.toMatch(/<script|alert\("x"\)/);
    expect(html).not.toContain('javascript:');
    expect(html).toContain('href="https://rules.example/oil"');
    expect(res.body.comment.bodyMarkdown).toBe(body);
  });

  it('gives the markdown back to its author only', async () => {
    const { setup } = await setupWithChange();
    await post(other, setup.id, { bodyMarkdown: 'Mine to edit' }).expect(201);
    expect((await thread(other, setup.id))[0]).toMatchObject({ bodyMarkdown: 'Mine to edit', canEdit: true, canDelete: true });
    expect((await thread(owner, setup.id))[0]).toMatchObject({ bodyMarkdown: '', canEdit: false, canDelete: false });
    expect((await thread(null, setup.id))[0]).toMatchObject({ bodyMarkdown: '', canEdit: false, canDelete: false });
  });
});

describe('editing and deleting', () => {
  it('lets the author edit within 15 minutes (the contract’s COMMENT_EDIT_MINUTES) and marks the comment edited', async () => {
    const { setup } = await setupWithChange();
    const created = (await post(other, setup.id, { bodyMarkdown: 'Rear oil 450?' }).expect(201)).body.comment;
    expect(created.editedAt).toBeNull();
    const res = await edit(other, created.id, { bodyMarkdown: 'Rear oil *500*?' });
    expect(res.status).toBe(200);
    expect(res.body.comment.bodyHtml).toContain('<em>500</em>');
    expect(res.body.comment.editedAt).not.toBeNull();
    expect((await thread(null, setup.id))[0]).toMatchObject({ id: created.id, bodyHtml: expect.stringContaining('<em>500</em>') });
  });

  it('refuses an edit after 15 minutes and an empty edit, keeping the body', async () => {
    const { setup } = await setupWithChange();
    const created = (await post(other, setup.id, { bodyMarkdown: 'First thoughts' }).expect(201)).body.comment;
    const empty = await edit(other, created.id, { bodyMarkdown: ' ' });
    expect(empty.status).toBe(400);
    expect(empty.body.error.details.bodyMarkdown).toBe('Write something before posting.');

    await t.db.sequelize.query("UPDATE comments SET created_at = now() - interval '16 minutes' WHERE id = :id", { replacements: { id: created.id } });
    const late = await edit(other, created.id, { bodyMarkdown: 'Second thoughts' });
    expect(late.status).toBe(403);
    expect(late.body.error.message).toBe('Comments can be edited for 15 minutes after posting.');
    const [listed] = await thread(other, setup.id);
    expect(listed).toMatchObject({ bodyMarkdown: 'First thoughts', editedAt: null, canEdit: false, canDelete: true });
  });

  it('deletes softly: the comment stays in the thread as deleted, with its author and replies', async () => {
    const { setup } = await setupWithChange();
    const top = (await post(other, setup.id, { bodyMarkdown: 'Will this survive?' }).expect(201)).body.comment;
    const reply = (await post(owner, setup.id, { bodyMarkdown: 'It should.', parentId: top.id }).expect(201)).body.comment;
    await remove(other, top.id).expect(204);

    const [listed] = await thread(other, setup.id);
    expect(listed).toMatchObject({ id: top.id, deleted: true, bodyHtml: '', bodyMarkdown: '', canEdit: false, canDelete: false });
    expect(listed.author.handle).toBe(otherHandle);
    expect(listed.replies.map((c) => c.id)).toEqual([reply.id]);

    const editDeleted = await edit(other, top.id, { bodyMarkdown: 'Back again' });
    expect(editDeleted.status).toBe(403);
    expect(editDeleted.body.error.message).toBe('Deleted comments cannot be edited.');
    await remove(other, top.id).expect(404);
    expect(await countVisibleComments(t.db, setup.id)).toBe(1);
  });

  it('lets nobody else edit or delete: 403 where they can see the comment, 404 where they cannot', async () => {
    const open = await setupWithChange();
    const theirs = (await post(other, open.setup.id, { bodyMarkdown: 'My comment' }).expect(201)).body.comment;
    expect((await edit(owner, theirs.id, { bodyMarkdown: 'Owner rewrites it' })).status).toBe(403);
    expect((await edit(moderator, theirs.id, { bodyMarkdown: 'Moderator rewrites it' })).status).toBe(403);
    expect((await remove(owner, theirs.id)).status).toBe(403);

    const closed = await setupWithChange('private');
    const note = (await post(owner, closed.setup.id, { bodyMarkdown: 'Private note' }).expect(201)).body.comment;
    expect((await edit(other, note.id, { bodyMarkdown: 'Guessing ids' })).status).toBe(404);
    expect((await remove(other, note.id)).status).toBe(404);
    expect((await edit(other, 999_999_999, { bodyMarkdown: 'Nothing here' })).status).toBe(404);

    const anonymous = await csrfAgent(t.app);
    expect((await edit(anonymous, theirs.id, { bodyMarkdown: 'Anonymous' })).status).toBe(401);
    expect((await thread(null, open.setup.id))[0]).toMatchObject({ bodyMarkdown: '', bodyHtml: '<p>My comment</p>\n', deleted: false });
  });
});

describe('hidden comments', () => {
  it('are left out for everyone but their author and moderators, and not counted', async () => {
    const { setup } = await setupWithChange();
    const hidden = (await post(other, setup.id, { bodyMarkdown: 'Buy my used tires' }).expect(201)).body.comment;
    const kept = (await post(owner, setup.id, { bodyMarkdown: 'Welcome, ask away.' }).expect(201)).body.comment;
    await t.db.models.Comment.update({ hiddenAt: new Date() }, { where: { id: hidden.id } });

    expect((await thread(null, setup.id)).map((c) => c.id)).toEqual([kept.id]);
    expect((await thread(owner, setup.id)).map((c) => c.id)).toEqual([kept.id]);
    expect((await thread(other, setup.id)).map((c) => c.id)).toEqual([hidden.id, kept.id]);
    expect((await thread(moderator, setup.id)).map((c) => c.id)).toEqual([hidden.id, kept.id]);
    expect((await post(owner, setup.id, { bodyMarkdown: 'Reply to hidden', parentId: hidden.id })).status).toBe(400);
    expect(await countVisibleComments(t.db, setup.id)).toBe(1);
  });
});

describe('counting and loading', () => {
  it('counts comments that are neither deleted nor hidden, as the setup page shows', async () => {
    const { setup, changeId } = await setupWithChange();
    const a = (await post(other, setup.id, { bodyMarkdown: 'One' }).expect(201)).body.comment;
    await post(owner, setup.id, { bodyMarkdown: 'Two', parentId: a.id }).expect(201);
    const c = (await post(other, setup.id, { bodyMarkdown: 'Three', revisionId: changeId }).expect(201)).body.comment;
    const d = (await post(other, setup.id, { bodyMarkdown: 'Four' }).expect(201)).body.comment;
    await remove(other, c.id).expect(204);
    await t.db.models.Comment.update({ hiddenAt: new Date() }, { where: { id: d.id } });
    expect(await countVisibleComments(t.db, setup.id)).toBe(2);
    const page = await request(t.app).get(`/api/setups/${setup.id}`).expect(200);
    expect(page.body.setup.commentCount).toBe(2);
  });

  it('loads a thread in the same number of queries whatever its length', async () => {
    const queriesFor = async (setupId: number) => {
      let count = 0;
      const hook = () => {
        count += 1;
      };
      t.db.sequelize.addHook('beforeQuery', 'countComments', hook);
      try {
        await thread(null, setupId);
      } finally {
        t.db.sequelize.removeHook('beforeQuery', 'countComments');
      }
      return count;
    };
    const short = await setupWithChange();
    await post(other, short.setup.id, { bodyMarkdown: 'Only one' }).expect(201);
    const long = await setupWithChange();
    for (let i = 0; i < 8; i += 1) {
      const top = (await post(i % 2 ? other : owner, long.setup.id, { bodyMarkdown: `Lap ${i}`, revisionId: i % 3 ? long.changeId : null }).expect(201)).body.comment;
      await post(i % 2 ? owner : other, long.setup.id, { bodyMarkdown: `Reply ${i}`, parentId: top.id }).expect(201);
    }
    expect((await thread(null, long.setup.id)).length).toBe(8);
    const shortQueries = await queriesFor(short.setup.id);
    expect(shortQueries).toBeGreaterThan(0);
    expect(await queriesFor(long.setup.id)).toBe(shortQueries);
  });
});

describe('posting rate limit', () => {
  let limited: TestApp;
  let fast: SessionAgent;
  let steady: SessionAgent;
  let setupId: number;

  beforeAll(async () => {
    limited = buildTestApp({
      commentRateLimit: { burst: { max: 2, windowMs: 60_000 }, sustained: { max: 3, windowMs: 60 * 60_000 } },
    });
    const a = await createRacer(limited.db);
    const b = await createRacer(limited.db);
    fast = await signIn(limited.app, a.handle, a.password);
    steady = await signIn(limited.app, b.handle, b.password);
    setupId = (await setupWithChange()).setup.id;
  });
  afterAll(async () => {
    await limited.close();
  });

  const postOn = (s: SessionAgent, n: number) =>
    s.agent.post(`/api/setups/${setupId}/comments`).set('X-CSRF-Token', s.csrf).send({ bodyMarkdown: `Comment ${n}` });

  it('answers 429 per racer once the short window is full, while other racers still post', async () => {
    expect((await postOn(fast, 1)).status).toBe(201);
    expect((await postOn(fast, 2)).status).toBe(201);
    const refused = await postOn(fast, 3);
    expect(refused.status).toBe(429);
    expect(refused.body.error.code).toBe('rate_limited');
    expect(refused.body.error.details.retryAfterSeconds).toBeGreaterThan(0);
    expect((await postOn(steady, 1)).status).toBe(201);
    await fast.agent.get(`/api/setups/${setupId}/comments`).expect(200);
  });

  it('has a longer window too, configured separately', async () => {
    const hourly = buildTestApp({ commentRateLimit: { burst: { max: 100, windowMs: 60_000 }, sustained: { max: 3, windowMs: 60 * 60_000 } } });
    try {
      const r = await createRacer(hourly.db);
      const s = await signIn(hourly.app, r.handle, r.password);
      const statuses: number[] = [];
      for (let i = 0; i < 4; i += 1) {
        statuses.push((await s.agent.post(`/api/setups/${setupId}/comments`).set('X-CSRF-Token', s.csrf).send({ bodyMarkdown: `Hourly ${i}` })).status);
      }
      expect(statuses).toEqual([201, 201, 201, 429]);
    } finally {
      await hourly.close();
    }
  });
});
