import { Router, type Request } from 'express';
import { setupImportSchema } from '../../shared/types/setups';
import type { RouterDeps } from '../app';
import { declareRoutes } from '../middleware/access';
import { photoUploadMiddleware, requireUploadedPhoto } from '../services/photos';
import { getFamily } from '../services/family';
import { forkSetup, previewFork } from '../services/forks';
import { getHistory, getRevisionDetail } from '../services/history';
import { applyUpstream, getUpstream } from '../services/upstream';
import { saveRevision } from '../services/revisions';
import { addSetupPhoto, removeSetupPhoto } from '../services/setupPhotos';
import { findViewableSetup } from '../services/setupAccess';
import { exportSetupCsv, exportSetupDocument, importSetupDocument } from '../services/setupDocuments';
import { createSetup, deleteSetup, getSetupDetail, updateSetupMeta } from '../services/setups';

const shareToken = (req: Request) => (typeof req.query.share === 'string' ? req.query.share : undefined);

/** A file name made of safe characters only, from the setup's title. */
function fileName(title: string, ext: string): string {
  return `${title.normalize('NFKD').replace(/[^A-Za-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 60) || 'setup'}.${ext}`;
}

export function setupsRouter(deps: RouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/setups');
  const { db } = deps;

  r.post('/', 'signedIn', async (req, res) => {
    const setup = await createSetup(db, req.user!, req.body);
    res.status(201).json({ setup: await getSetupDetail(db, setup.id, req.user) });
  });

  r.post('/import', 'signedIn', async (req, res) => {
    const { carId, document } = setupImportSchema.parse(req.body);
    const setup = await importSetupDocument(db, req.user!, carId, document);
    res.status(201).json({ setup: await getSetupDetail(db, setup.id, req.user) });
  });

  r.get('/:id', 'public', async (req, res) => {
    res.set('Cache-Control', 'private, no-cache').json({ setup: await getSetupDetail(db, Number(req.params.id), req.user, shareToken(req)) });
  });

  r.patch('/:id', 'signedIn', async (req, res) => {
    const setup = await updateSetupMeta(db, req.user!, Number(req.params.id), req.body);
    res.json({ setup: await getSetupDetail(db, setup.id, req.user) });
  });

  r.delete('/:id', 'signedIn', async (req, res) => {
    await deleteSetup(db, req.user!, Number(req.params.id));
    res.status(204).end();
  });

  r.post('/:id/revisions', 'signedIn', async (req, res) => {
    const { revision, warnings } = await saveRevision(db, req.user!, Number(req.params.id), req.body);
    res.status(201).json({ setup: await getSetupDetail(db, revision.setupId, req.user), warnings });
  });

  r.post('/:id/photos', 'signedIn', photoUploadMiddleware(deps.config), async (req, res) => {
    const caption = typeof req.body?.caption === 'string' ? req.body.caption : undefined;
    await addSetupPhoto(deps, req.user!, Number(req.params.id), requireUploadedPhoto(req), caption);
    res.status(201).json({ setup: await getSetupDetail(db, Number(req.params.id), req.user) });
  });

  r.delete('/:id/photos/:photoId', 'signedIn', async (req, res) => {
    await removeSetupPhoto(deps, req.user!, Number(req.params.id), Number(req.params.photoId));
    res.json({ setup: await getSetupDetail(db, Number(req.params.id), req.user) });
  });

  r.post('/:id/forks', 'signedIn', async (req, res) => {
    const fork = await forkSetup(db, req.user!, Number(req.params.id), req.body);
    res.status(201).json({ setup: await getSetupDetail(db, fork.id, req.user) });
  });

  r.get('/:id/fork-preview', 'signedIn', async (req, res) => {
    res.json(await previewFork(db, req.user!, Number(req.params.id), req.query));
  });

  r.get('/:id/upstream', 'signedIn', async (req, res) => {
    res.set('Cache-Control', 'private, no-cache').json(await getUpstream(db, req.user!, Number(req.params.id)));
  });

  r.post('/:id/upstream', 'signedIn', async (req, res) => {
    const { setupId, taken } = await applyUpstream(db, req.user!, Number(req.params.id), req.body);
    res.status(taken > 0 ? 201 : 200).json({ setup: await getSetupDetail(db, setupId, req.user), taken });
  });

  r.get('/:id/history', 'public', async (req, res) => {
    res.set('Cache-Control', 'private, no-cache').json(await getHistory(db, Number(req.params.id), req.user, shareToken(req)));
  });

  r.get('/:id/revisions/:number', 'public', async (req, res) => {
    res.json(await getRevisionDetail(db, Number(req.params.id), Number(req.params.number), req.user, shareToken(req)));
  });

  r.get('/:id/family', 'public', async (req, res) => {
    res.json(await getFamily(db, Number(req.params.id), req.user, shareToken(req)));
  });

  r.get('/:id/export.json', 'public', async (req, res) => {
    const setup = await findViewableSetup(db, Number(req.params.id), req.user, shareToken(req));
    res.attachment(fileName(setup.title, 'tunefork.json')).json(await exportSetupDocument(db, setup, req.user));
  });

  r.get('/:id/export.csv', 'public', async (req, res) => {
    const setup = await findViewableSetup(db, Number(req.params.id), req.user, shareToken(req));
    res.attachment(fileName(setup.title, 'csv')).type('text/csv; charset=utf-8').send(await exportSetupCsv(db, setup));
  });
  return router;
}
