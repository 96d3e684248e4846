// A local S3-compatible fake with path-style addressing: PutObject, GetObject, HeadObject,
// DeleteObject, ListObjectsV2, CreateBucket, HeadBucket. Objects are files under its data folder.
// It does not check request signatures (loopback only); the real service does.
import crypto from 'node:crypto';
import fs from 'node:fs';
import http from 'node:http';
import path from 'node:path';

const xmlEscape = (s) =>
  String(s).replace(
    /[<>&"']/g,
    (c) => ({ '<': '&lt;', '>': '&gt;', '&': '&amp;', '"': '&quot;', "'": '&apos;' })[c],
  );

function xmlError(res, status, code, message, resource = '') {
  res.writeHead(status, { 'content-type': 'application/xml' });
  res.end(
    `<?xml version="1.0" encoding="UTF-8"?><Error><Code>${code}</Code><Message>${xmlEscape(message)}</Message><Resource>${xmlEscape(resource)}</Resource><RequestId>local</RequestId></Error>`,
  );
}

function readBody(req) {
  return new Promise((resolve, reject) => {
    const chunks = [];
    req.on('data', (c) => chunks.push(c));
    req.on('end', () => resolve(Buffer.concat(chunks)));
    req.on('error', reject);
  });
}

/** Undoes `aws-chunked` content encoding: `<hex>[;ext]\r\n<data>\r\n ... 0\r\n<trailers>\r\n\r\n`. */
export function decodeAwsChunked(buf) {
  const out = [];
  let i = 0;
  while (i < buf.length) {
    const eol = buf.indexOf('\r\n', i);
    if (eol < 0) break;
    const size = parseInt(buf.subarray(i, eol).toString('latin1').split(';')[0], 16);
    if (!Number.isFinite(size) || size === 0) break;
    out.push(buf.subarray(eol + 2, eol + 2 + size));
    i = eol + 2 + size + 2;
  }
  return Buffer.concat(out);
}

const validBucket = (b) => /^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/.test(b);

/** Starts the fake on loopback; returns its port and a close(). */
export async function startS3Fake({ host = '127.0.0.1', port = 0, dir }) {
  fs.mkdirSync(dir, { recursive: true });
  const bucketDir = (b) => path.join(dir, b);
  const objPath = (b, key) => path.join(bucketDir(b), 'objects', encodeURIComponent(key));
  const metaPath = (b, key) => path.join(bucketDir(b), 'meta', `${encodeURIComponent(key)}.json`);
  const ensureBucket = (b) => {
    fs.mkdirSync(path.join(bucketDir(b), 'objects'), { recursive: true });
    fs.mkdirSync(path.join(bucketDir(b), 'meta'), { recursive: true });
  };

  const server = http.createServer(async (req, res) => {
    try {
      const url = new URL(req.url, 'http://s3');
      if (url.pathname === '/health') {
        res.writeHead(200, { 'content-type': 'application/json' });
        return res.end('{"ok":true}');
      }
      const [, bucket = '', ...rest] = url.pathname.split('/');
      const key = decodeURIComponent(rest.join('/'));
      if (!validBucket(bucket))
        return xmlError(res, 400, 'InvalidBucketName', 'bad bucket', bucket);
      if (encodeURIComponent(key).length > 1000)
        return xmlError(res, 400, 'KeyTooLongError', 'key too long');

      if (!key) {
        if (req.method === 'PUT') {
          await readBody(req);
          ensureBucket(bucket);
          res.writeHead(200, { location: `/${bucket}` });
          return res.end();
        }
        if (!fs.existsSync(bucketDir(bucket)))
          return xmlError(res, 404, 'NoSuchBucket', 'The specified bucket does not exist', bucket);
        if (req.method === 'HEAD') {
          res.writeHead(200);
          return res.end();
        }
        if (req.method === 'GET') {
          const prefix = url.searchParams.get('prefix') || '';
          const max = Math.min(Number(url.searchParams.get('max-keys') || 1000), 1000);
          const after = url.searchParams.get('continuation-token')
            ? Buffer.from(url.searchParams.get('continuation-token'), 'base64url').toString()
            : url.searchParams.get('start-after') || '';
          const keys = fs
            .readdirSync(path.join(bucketDir(bucket), 'objects'))
            .map((f) => decodeURIComponent(f))
            .filter((k) => k.startsWith(prefix) && k > after)
            .sort();
          const page = keys.slice(0, max);
          const truncated = keys.length > max;
          const contents = page
            .map((k) => {
              const m = JSON.parse(fs.readFileSync(metaPath(bucket, k), 'utf8'));
              return `<Contents><Key>${xmlEscape(k)}</Key><LastModified>${m.lastModified}</LastModified><ETag>&quot;${m.etag}&quot;</ETag><Size>${m.size}</Size><StorageClass>STANDARD</StorageClass></Contents>`;
            })
            .join('');
          const next = truncated
            ? `<NextContinuationToken>${Buffer.from(page[page.length - 1]).toString('base64url')}</NextContinuationToken>`
            : '';
          res.writeHead(200, { 'content-type': 'application/xml' });
          return res.end(
            `<?xml version="1.0" encoding="UTF-8"?><ListBucketResult xmlns="http://s3.amazonaws.com/doc/2006-03-01/"><Name>${xmlEscape(bucket)}</Name><Prefix>${xmlEscape(prefix)}</Prefix><KeyCount>${page.length}</KeyCount><MaxKeys>${max}</MaxKeys><IsTruncated>${truncated}</IsTruncated>${contents}${next}</ListBucketResult>`,
          );
        }
        return xmlError(res, 405, 'MethodNotAllowed', 'method not allowed');
      }

      if (req.method === 'PUT') {
        let body = await readBody(req);
        const enc = String(req.headers['content-encoding'] || '');
        if (
          enc.includes('aws-chunked') ||
          String(req.headers['x-amz-content-sha256'] || '').startsWith('STREAMING-')
        )
          body = decodeAwsChunked(body);
        ensureBucket(bucket);
        const etag = crypto.createHash('md5').update(body).digest('hex');
        const userMeta = {};
        for (const [h, v] of Object.entries(req.headers))
          if (h.startsWith('x-amz-meta-')) userMeta[h.slice(11)] = String(v);
        const meta = {
          contentType: String(req.headers['content-type'] || 'application/octet-stream'),
          size: body.length,
          etag,
          lastModified: new Date().toISOString(),
          userMeta,
        };
        fs.writeFileSync(objPath(bucket, key), body);
        fs.writeFileSync(metaPath(bucket, key), JSON.stringify(meta));
        res.writeHead(200, { etag: `"${etag}"` });
        return res.end();
      }
      if (req.method === 'DELETE') {
        fs.rmSync(objPath(bucket, key), { force: true });
        fs.rmSync(metaPath(bucket, key), { force: true });
        res.writeHead(204);
        return res.end();
      }
      if (req.method === 'GET' || req.method === 'HEAD') {
        if (!fs.existsSync(metaPath(bucket, key)))
          return xmlError(res, 404, 'NoSuchKey', 'The specified key does not exist.', key);
        const meta = JSON.parse(fs.readFileSync(metaPath(bucket, key), 'utf8'));
        const headers = {
          'content-type': meta.contentType,
          'content-length': String(meta.size),
          etag: `"${meta.etag}"`,
          'last-modified': new Date(meta.lastModified).toUTCString(),
          'accept-ranges': 'bytes',
        };
        for (const [k, v] of Object.entries(meta.userMeta || {})) headers[`x-amz-meta-${k}`] = v;
        res.writeHead(200, headers);
        if (req.method === 'HEAD') return res.end();
        return fs.createReadStream(objPath(bucket, key)).pipe(res);
      }
      xmlError(res, 405, 'MethodNotAllowed', 'method not allowed');
    } catch (err) {
      xmlError(res, 500, 'InternalError', String(err && err.message));
    }
  });

  const bound = await new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      server.off('error', reject);
      resolve(server.address().port);
    });
  });
  return {
    port: bound,
    url: `http://${host}:${bound}`,
    close: () =>
      new Promise((r) => {
        server.closeAllConnections?.();
        server.close(r);
      }),
  };
}
