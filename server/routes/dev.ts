import { Router } from 'express';
import sanitizeHtml from 'sanitize-html';
import type { RouterDeps } from '../app';
import { declareRoutes } from '../middleware/access';

/** Development and test only (never mounted in production): the fake SMTP server's mailbox. */
export function devRouter(deps: RouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/dev');
  r.get('/mailbox', 'public', async (_req, res) => {
    const rows = await deps.db.models.MailboxMessage.findAll({ order: [['id', 'DESC']], limit: 100 });
    res.set('Cache-Control', 'no-store').json({
      messages: rows.map((m) => ({
        id: m.id,
        to: m.toAddress,
        subject: m.subject,
        text: m.textBody,
        html: sanitizeHtml(m.htmlBody),
        receivedAt: m.receivedAt.toISOString(),
      })),
    });
  });
  return router;
}
