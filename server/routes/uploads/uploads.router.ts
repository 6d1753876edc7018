import { randomUUID } from 'node:crypto';
import { Readable } from 'node:stream';
import { Router, type Request, type Response } from 'express';
import { Server } from '@tus/server';
import { z } from 'zod';
import { idParams } from '@shared/schemas/studio';
import { config } from '../../config';
import { route } from '../../lib/route';
import { BadRequestError, InvalidInputError, NotFoundError, TooLargeError } from '../../lib/errors';
import { HEAD_BYTES, limitMessage } from '../../middlewares/upload';
import { authorize } from '../../policies';
import { loadTutorial } from '../../services/access';
import {
  checkRecordingHead,
  finishResumable,
  findResumable,
  parseUploadMetadata,
  resumableStore,
  startUploadSweep,
  uploadMetadataHeader,
} from '../../services/resumable-uploads';
import { presentRecording } from '../../presenters/recording.presenter';
import type { User } from '../../models';

const PATH = '/api/uploads';
const newUploadMeta = z.object({ tutorialId: z.uuid(), filename: z.string().trim().min(1).max(255).optional() });

/** The tus protocol handler (tus.io 1.0: creation, termination, expiration); this router authorizes every call before it. */
function tusServer(maxBytes: number) {
  return new Server({
    path: PATH,
    datastore: resumableStore,
    maxSize: maxBytes,
    relativeLocation: true,
    // the upload's id becomes the recording's id, so its files sit under recordings/<id>/ like any other
    namingFunction: () => randomUUID(),
  });
}

/** The request as tus reads it, with a body of our choosing (the bytes read to check the kind, then the rest). */
function webRequest(req: Request, o: { headers?: Record<string, string>; body?: Readable } = {}): globalThis.Request {
  const headers = new Headers();
  for (const [k, v] of Object.entries(req.headers)) if (typeof v === 'string') headers.set(k, v);
  // tus honours a method override; the method this router authorized is the only one it gets
  headers.delete('x-http-method-override');
  for (const [k, v] of Object.entries(o.headers ?? {})) headers.set(k, v);
  const url = new URL(req.originalUrl, `${req.protocol}://${req.get('host') ?? 'localhost'}`);
  const hasBody = req.method === 'PATCH' || req.method === 'POST';
  const body = hasBody ? (Readable.toWeb(o.body ?? req) as ReadableStream) : undefined;
  return new Request(url, { method: req.method, headers, body, ...(body ? { duplex: 'half' } : {}) } as RequestInit);
}

async function send(res: Response, answer: globalThis.Response, extra?: unknown) {
  res.status(extra ? 201 : answer.status);
  answer.headers.forEach((v, k) => res.setHeader(k, v));
  if (extra) return void res.json(extra);
  res.end(Buffer.from(await answer.arrayBuffer()));
}

/** The first bytes of a PATCH body checked for a video's signature, and the whole body to hand on. */
async function checkedBody(req: Request, filename: string): Promise<Readable> {
  const it = req[Symbol.asyncIterator]() as AsyncIterator<Buffer>;
  const head: Buffer[] = [];
  let bytes = 0;
  let ended = false;
  while (bytes < HEAD_BYTES) {
    const next = await it.next();
    if (next.done) {
      ended = true;
      break;
    }
    head.push(next.value);
    bytes += next.value.length;
  }
  const first = Buffer.concat(head);
  try {
    await checkRecordingHead(first, filename);
  } catch (e) {
    // read the rest so the answer reaches a client that is still sending
    if (!ended) for (let n = await it.next(); !n.done; n = await it.next());
    throw e;
  }
  return Readable.from(
    (async function* () {
      yield first;
      if (ended) return;
      for (let n = await it.next(); !n.done; n = await it.next()) yield n.value;
    })(),
  );
}

const dropUpload =
  (id: string) =>
  async (e: unknown): Promise<never> => {
    await resumableStore.remove(id).catch(() => {});
    throw e;
  };

/** An upload the caller started, on a tutorial they can still edit; anyone else gets 404. */
async function ownUpload(user: User, id: string) {
  const upload = await findResumable(id);
  if (upload.meta.uploadedBy !== user.id) throw new NotFoundError('Upload');
  const { abilities } = await loadTutorial(user, upload.meta.tutorialId);
  authorize(abilities, 'update', 'Only people who can edit this tutorial can upload footage');
  return upload;
}

/**
 * Resumable recording uploads (tus 1.0) at /api/uploads: POST starts one for a tutorial (metadata
 * `tutorialId`, `filename`), HEAD says how far it got, PATCH sends the next bytes, DELETE drops it.
 * The last PATCH answers 201 with the new recording. Session and CSRF as the rest of the API.
 */
export function uploadsRouter(opts: { maxUploadBytes?: number } = {}) {
  const maxBytes = opts.maxUploadBytes ?? config.maxUploadBytes;
  const tus = tusServer(maxBytes);
  startUploadSweep();
  const r = Router();

  r.post(
    '/',
    route({}, async ({ user, req, res }) => {
      const meta = newUploadMeta.safeParse(parseUploadMetadata(req.get('upload-metadata')));
      if (!meta.success)
        throw new InvalidInputError([{ path: 'tutorialId', message: 'Required' }], 'Say which tutorial the recording is for (metadata "tutorialId")');
      const { tutorial, abilities } = await loadTutorial(user, meta.data.tutorialId);
      authorize(abilities, 'update', 'Only people who can edit this tutorial can upload footage');
      const length = Number(req.get('upload-length'));
      if (!Number.isSafeInteger(length) || length < 0)
        throw new BadRequestError('Say how large the file is (Upload-Length); uploads of unknown length are not taken');
      if (length > maxBytes) throw new TooLargeError(limitMessage('recording', maxBytes));
      if (length === 0) throw new BadRequestError('The file is empty; choose the recording again');
      if (Number(req.get('content-length') ?? 0) > 0) throw new BadRequestError('Send the bytes with PATCH after the upload is created');
      // the server writes who and where itself: nothing the client adds can point an upload elsewhere
      const headers = {
        'upload-metadata': uploadMetadataHeader({ tutorialId: tutorial.id, uploadedBy: user.id, filename: meta.data.filename ?? 'recording' }),
      };
      await send(res, await tus.handleWeb(webRequest(req, { headers })));
    }),
  );

  r.head(
    '/:id',
    route({ params: idParams }, async ({ params, user, req, res }) => {
      const upload = await ownUpload(user, params.id);
      // complete but not yet kept (the finishing step was interrupted): finish it now
      if (upload.size !== undefined && upload.offset === upload.size) {
        await finishResumable(upload.id);
        res.set({ 'Tus-Resumable': '1.0.0', 'Upload-Offset': String(upload.size), 'Upload-Length': String(upload.size), 'Cache-Control': 'no-store' });
        return void res.status(200).end();
      }
      await send(res, await tus.handleWeb(webRequest(req)));
    }),
  );

  r.patch(
    '/:id',
    route({ params: idParams }, async ({ params, user, req, res }) => {
      const upload = await ownUpload(user, params.id);
      // a refused file leaves nothing behind: its (empty) upload goes with the answer
      const body = upload.offset === 0 ? await checkedBody(req, upload.meta.filename).catch(dropUpload(upload.id)) : undefined;
      const answer = await tus.handleWeb(webRequest(req, { body }));
      const offset = Number(answer.headers.get('upload-offset'));
      if (answer.status !== 204 || offset !== upload.size) return send(res, answer);
      await send(res, answer, presentRecording(await finishResumable(upload.id)));
    }),
  );

  r.delete(
    '/:id',
    route({ params: idParams }, async ({ params, user, req, res }) => {
      await ownUpload(user, params.id);
      await send(res, await tus.handleWeb(webRequest(req)));
    }),
  );

  return r;
}
