/**
 * A minimal S3-compatible server for tests: path-style HeadBucket, PutObject (honouring
 * If-None-Match: *), GetObject and DeleteObject, the four calls server/storage/storage.ts makes,
 * with S3's XML error bodies (NoSuchKey, NoSuchBucket, PreconditionFailed). Objects live in memory;
 * signatures are not verified (the SDK signs every request; that the store checks them is its
 * business). `objects` is exposed so a test can corrupt what is stored.
 */
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';

export interface FakeS3 {
  url: string;
  objects: Map<string, { body: Buffer; contentType: string }>;
  requests: string[];
  close(): Promise<void>;
}

function xmlError(res: ServerResponse, status: number, code: string, message: string): void {
  res.writeHead(status, { 'content-type': 'application/xml' });
  res.end(
    `<?xml version="1.0" encoding="UTF-8"?><Error><Code>${code}</Code><Message>${message}</Message></Error>`,
  );
}

async function body(req: IncomingMessage): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const c of req) chunks.push(c as Buffer);
  return Buffer.concat(chunks);
}

export async function startFakeS3(buckets: string[]): Promise<FakeS3> {
  const objects = new Map<string, { body: Buffer; contentType: string }>();
  const requests: string[] = [];
  const server = createServer((req, res) => {
    void (async () => {
      const url = new URL(req.url ?? '/', 'http://localhost');
      const [, bucket, ...rest] = decodeURIComponent(url.pathname).split('/');
      const key = rest.join('/');
      requests.push(`${req.method} /${bucket}${key ? `/${key}` : ''}`);
      if (!buckets.includes(bucket)) return xmlError(res, 404, 'NoSuchBucket', 'The bucket does not exist');
      const id = `${bucket}/${key}`;
      if (req.method === 'HEAD' && !key) {
        res.writeHead(200);
        return res.end();
      }
      if (req.method === 'PUT' && key) {
        const bytes = await body(req);
        if (req.headers['if-none-match'] === '*' && objects.has(id))
          return xmlError(res, 412, 'PreconditionFailed', 'At least one of the preconditions failed');
        objects.set(id, {
          body: bytes,
          contentType: String(req.headers['content-type'] ?? 'application/octet-stream'),
        });
        res.writeHead(200, { etag: `"${bytes.length}"` });
        return res.end();
      }
      if (req.method === 'GET' && key) {
        const object = objects.get(id);
        if (!object) return xmlError(res, 404, 'NoSuchKey', 'The specified key does not exist.');
        res.writeHead(200, {
          'content-type': object.contentType,
          'content-length': String(object.body.length),
          etag: `"${object.body.length}"`,
        });
        return res.end(object.body);
      }
      if (req.method === 'DELETE' && key) {
        objects.delete(id);
        res.writeHead(204);
        return res.end();
      }
      xmlError(res, 501, 'NotImplemented', 'Not implemented by the test fake');
    })().catch((err: unknown) => xmlError(res, 500, 'InternalError', String(err)));
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}`,
    objects,
    requests,
    close: () =>
      new Promise<void>((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}
