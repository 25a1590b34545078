import crypto from 'node:crypto';
import express, { Router, type Request } from 'express';
import type { Config } from '../config';

/** Where the local stand-in for GitHub's OAuth endpoints is mounted (development and tests only). */
export const FAKE_GITHUB_MOUNT = '/fake-github';

type FakeAccount = { login: string; name: string; email: string; verified: boolean };
type Grant = FakeAccount & { redirectUri: string; expiresAt: number };

/** Invented accounts offered on the consent page; the second shares a demo racer's address. */
export const FAKE_GITHUB_PRESETS: FakeAccount[] = [
  { login: 'trackside-tess', name: 'Tess Marlowe', email: 'tess@racers.example', verified: true },
  { login: 'juno-b', name: 'Juno Braithwick', email: 'juno@racers.example', verified: true },
];

const CODE_TTL_MS = 5 * 60 * 1000;
const TOKEN_TTL_MS = 60 * 60 * 1000;

function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

function numericId(login: string): number {
  return parseInt(crypto.createHash('sha256').update(login.toLowerCase()).digest('hex').slice(0, 8), 16);
}

function bearer(req: Request): string | null {
  const match = /^(?:token|bearer)\s+(.+)$/i.exec(req.headers.authorization ?? '');
  return match ? match[1] : null;
}

function consentPage(q: { client_id: string; redirect_uri: string; state: string }, error?: string): string {
  const hidden = Object.entries(q)
    .map(([k, v]) => `<input type="hidden" name="${k}" value="${escapeHtml(v)}">`)
    .join('');
  const presets = FAKE_GITHUB_PRESETS.map(
    (p, i) =>
      `<label style="display:block;padding:8px 0"><input type="radio" name="preset" value="${i}"${i === 0 ? ' checked' : ''}> ${escapeHtml(p.name)} (@${escapeHtml(p.login)}, ${escapeHtml(p.email)})</label>`,
  ).join('');
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<title>Local sign-in provider</title></head>
<body style="font-family:system-ui,sans-serif;max-width:480px;margin:24px auto;padding:0 16px;color:#1C1F22">
<main><h1 style="font-size:22px">Local stand-in for GitHub</h1>
<p>This page only exists in development and tests. Pick an invented account, or type one, to continue to Tunefork.</p>
${error ? `<p role="alert" style="color:#A3241B">${escapeHtml(error)}</p>` : ''}
<form method="post">${hidden}
<fieldset style="border:1px solid #D9D5CE;border-radius:8px"><legend>Account</legend>${presets}
<label style="display:block;padding:8px 0"><input type="radio" name="preset" value="custom"> Another account:</label>
<label style="display:block">Login <input name="login" autocomplete="off" style="min-height:36px"></label>
<label style="display:block">Name <input name="name" autocomplete="off" style="min-height:36px"></label>
<label style="display:block">E-mail <input name="email" type="email" autocomplete="off" style="min-height:36px"></label>
<label style="display:block;padding:8px 0"><input type="checkbox" name="verified" value="yes" checked> E-mail verified</label>
</fieldset>
<p><button type="submit" name="decision" value="allow" style="min-height:44px;padding:0 20px">Authorize Tunefork</button>
<button type="submit" name="decision" value="deny" style="min-height:44px;padding:0 20px">Cancel</button></p>
</form></main></body></html>`;
}

/**
 * A small OAuth 2 provider with GitHub's endpoint shapes, so passport-github2 runs its real
 * redirect → consent → code → token → profile dance without leaving this machine. Grants and tokens
 * are kept in this process's memory: it is a development stand-in, not a shared service.
 */
export function fakeGithubRouter(config: Config): Router {
  const github = config.github;
  if (!github?.useFakeProvider) throw new Error('the fake GitHub provider is only for configurations that use it');
  const codes = new Map<string, Grant>();
  const tokens = new Map<string, FakeAccount & { expiresAt: number }>();
  const router = Router();
  router.use(express.urlencoded({ extended: false, limit: '10kb' }));

  const validRequest = (q: Record<string, unknown>) =>
    q.client_id === github.clientId && typeof q.redirect_uri === 'string' && q.redirect_uri.startsWith(`${config.publicUrl}/`);

  router.get('/login/oauth/authorize', (req, res) => {
    const q = req.query as Record<string, string>;
    if (!validRequest(q)) return void res.status(400).type('text/plain').send('Unknown client or redirect address.');
    res.type('html').send(consentPage({ client_id: q.client_id, redirect_uri: q.redirect_uri, state: q.state ?? '' }));
  });

  router.post('/login/oauth/authorize', (req, res) => {
    const b = req.body as Record<string, string>;
    if (!validRequest(b)) return void res.status(400).type('text/plain').send('Unknown client or redirect address.');
    const back = new URL(b.redirect_uri);
    if (b.state) back.searchParams.set('state', b.state);
    if (b.decision !== 'allow') {
      back.searchParams.set('error', 'access_denied');
      return void res.redirect(303, back.toString());
    }
    const preset = b.preset === 'custom' ? null : FAKE_GITHUB_PRESETS[Number(b.preset)];
    const account: FakeAccount | null = preset ?? (b.login?.trim() ? { login: b.login.trim().slice(0, 39), name: (b.name ?? '').trim().slice(0, 80), email: (b.email ?? '').trim().slice(0, 254), verified: b.verified === 'yes' } : null);
    if (!account) {
      return void res.status(400).type('html').send(consentPage({ client_id: b.client_id, redirect_uri: b.redirect_uri, state: b.state ?? '' }, 'Type a login for the other account.'));
    }
    const code = crypto.randomBytes(16).toString('hex');
    codes.set(code, { ...account, redirectUri: b.redirect_uri, expiresAt: Date.now() + CODE_TTL_MS });
    back.searchParams.set('code', code);
    res.redirect(303, back.toString());
  });

  router.post('/login/oauth/access_token', (req, res) => {
    const b = req.body as Record<string, string>;
    const grant = codes.get(b.code ?? '');
    codes.delete(b.code ?? '');
    if (b.client_id !== github.clientId || b.client_secret !== github.clientSecret || !grant || grant.expiresAt < Date.now() || (b.redirect_uri && b.redirect_uri !== grant.redirectUri)) {
      return void res.status(400).json({ error: 'bad_verification_code', error_description: 'The code is wrong or expired.' });
    }
    const accessToken = crypto.randomBytes(20).toString('hex');
    tokens.set(accessToken, { login: grant.login, name: grant.name, email: grant.email, verified: grant.verified, expiresAt: Date.now() + TOKEN_TTL_MS });
    res.json({ access_token: accessToken, token_type: 'bearer', scope: 'user:email' });
  });

  const account = (req: Request) => {
    const t = tokens.get(bearer(req) ?? '');
    return t && t.expiresAt > Date.now() ? t : null;
  };

  router.get('/api/user', (req, res) => {
    const a = account(req);
    if (!a) return void res.status(401).json({ message: 'Bad credentials' });
    res.json({ id: numericId(a.login), login: a.login, name: a.name || null, email: null, html_url: `${config.publicUrl}${FAKE_GITHUB_MOUNT}/${a.login}` });
  });

  router.get('/api/user/emails', (req, res) => {
    const a = account(req);
    if (!a) return void res.status(401).json({ message: 'Bad credentials' });
    // The real provider always lists at least a private relay address, unverified for our purposes.
    res.json([a.email ? { email: a.email, primary: true, verified: a.verified } : { email: `${a.login}@users.invalid`, primary: true, verified: false }]);
  });
  return router;
}
