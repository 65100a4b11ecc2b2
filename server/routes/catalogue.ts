import { Router, type Request } from 'express';
import multer from 'multer';
import type { Deps } from '../deps';
import { AppError } from '../errors';
import { authOf, requireAuth } from '../middleware/auth';
import type { catalogueService } from '../services/catalogue-service';
import { MAX_CSV_BYTES } from '../services/csv/read-csv';
import { idParam } from './params';

type Service = ReturnType<typeof catalogueService<unknown>>;

const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_CSV_BYTES, files: 1, fields: 10 } });

/** multer's own errors (file too large, wrong field) become 400s that say which. */
export function receiveFile(req: Request, res: Parameters<ReturnType<typeof upload.single>>[1]): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    upload.single('file')(req, res, (err: unknown) => {
      if (err instanceof multer.MulterError) {
        const message = err.code === 'LIMIT_FILE_SIZE' ? `file: larger than ${MAX_CSV_BYTES / 1024} KiB` : `${err.field ?? 'file'}: ${err.message}`;
        return reject(new AppError(err.code === 'LIMIT_FILE_SIZE' ? 413 : 400, 'upload_invalid', message, [{ path: 'file', message }]));
      }
      if (err) return reject(err);
      if (!req.file) return reject(AppError.badRequest('file: attach a CSV file in the "file" field', [{ path: 'file', message: 'is required' }]));
      resolve(req.file.buffer);
    });
  });
}

export function parseMapping(raw: unknown): Record<string, unknown> {
  if (typeof raw !== 'string' || raw === '') throw AppError.badRequest('mapping: send the column mapping as JSON in the "mapping" field', [{ path: 'mapping', message: 'is required' }]);
  try {
    const m = JSON.parse(raw);
    if (typeof m !== 'object' || m === null || Array.isArray(m)) throw new Error('not an object');
    return m as Record<string, unknown>;
  } catch {
    throw AppError.badRequest('mapping: is not a JSON object', [{ path: 'mapping', message: 'is not a JSON object' }]);
  }
}

const teamQuery = (req: Request) => (req.query.teamId === undefined ? undefined : idParam(String(req.query.teamId)));

/** CRUD, CSV preview, all-or-nothing CSV import and CSV export of one team catalogue. */
export function catalogueRouter({ db }: Deps, service: Service, fileName: string) {
  const router = Router();
  router.use(requireAuth(db));

  router.get('/', async (req, res) => {
    res.json({ items: await service.list(db, authOf(res), teamQuery(req)) });
  });
  router.get('/export.csv', async (req, res) => {
    const csv = await service.exportCsv(db, authOf(res), teamQuery(req));
    res.type('text/csv').attachment(fileName).send(csv);
  });
  router.post('/import/preview', async (req, res) => {
    const buffer = await receiveFile(req, res);
    res.json(service.preview(buffer));
  });
  router.post('/import', async (req, res) => {
    const buffer = await receiveFile(req, res);
    const mapping = parseMapping((req.body as Record<string, unknown>)?.mapping);
    const teamId = (req.body as Record<string, unknown>)?.teamId;
    res.status(201).json(await service.importCsv(db, authOf(res), buffer, mapping as never, teamId === undefined ? undefined : idParam(String(teamId))));
  });
  router.post('/', async (req, res) => {
    res.status(201).json({ item: await service.create(db, authOf(res), (req.body ?? {}) as Record<string, unknown>) });
  });
  router.get('/:id', async (req, res) => {
    res.json({ item: service.view(await service.find(db, authOf(res), idParam(req.params.id as string))) });
  });
  router.put('/:id', async (req, res) => {
    res.json({ item: await service.update(db, authOf(res), idParam(req.params.id as string), (req.body ?? {}) as Record<string, unknown>) });
  });
  router.delete('/:id', async (req, res) => {
    await service.remove(db, authOf(res), idParam(req.params.id as string));
    res.status(204).end();
  });

  return router;
}
