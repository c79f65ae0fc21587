import http from 'node:http';
import net from 'node:net';

/** An answer as received: status, headers (lower-case names) and body text. */
export interface Answer {
  readonly status: number;
  readonly headers: Readonly<Record<string, string | string[] | undefined>>;
  readonly text: string;
}

export interface SendOptions {
  readonly method: string;
  readonly path: string;
  readonly headers?: Record<string, string>;
  readonly body?: Uint8Array;
  /** Gives up after this long, ms; the request then counts as unanswered. */
  readonly timeoutMs?: number;
}

/** A connection per request: a kept-alive socket the service closes between requests would fail the next one. */
const agent = new http.Agent({ keepAlive: false, maxSockets: 16 });

/**
 * One HTTP/1.1 request with node:http, which sends what fetch refuses (any method token, a
 * body on any method, bytes that are not UTF-8). Resolves with the answer, or with the
 * client-side error when there was none.
 */
export function send(
  baseUrl: string,
  options: SendOptions,
): Promise<Answer | { readonly error: string }> {
  const url = new URL(baseUrl);
  return new Promise((resolve) => {
    const request = http.request(
      {
        agent,
        host: url.hostname,
        port: url.port,
        method: options.method,
        path: options.path,
        headers: {
          ...(options.headers ?? {}),
          ...(options.body ? { 'content-length': String(options.body.length) } : {}),
        },
        timeout: options.timeoutMs ?? 120_000,
      },
      (response) => {
        const chunks: Buffer[] = [];
        response.on('data', (chunk: Buffer) => chunks.push(chunk));
        response.on('end', () =>
          resolve({
            status: response.statusCode ?? 0,
            headers: response.headers,
            text: Buffer.concat(chunks).toString('utf8'),
          }),
        );
        response.on('error', (error) => resolve({ error: error.message }));
      },
    );
    request.on('timeout', () => request.destroy(new Error('timed out')));
    // A service that answers early (413) and closes fails our remaining writes; that is expected.
    request.on('socket', (socket) => socket.on('error', () => undefined));
    request.on('error', (error) => resolve({ error: error.message }));
    request.end(options.body);
  });
}

/** Frees the kept-alive sockets (call when done, so the test process can exit). */
export const closeClient = (): void => agent.destroy();

/**
 * Raw bytes on a fresh TCP connection, for requests no HTTP client would send (malformed
 * request lines, bad chunking, headers over the limit, a body cut short). With `halfClose` the
 * writing side is closed after the bytes, as a client that gave up mid-body does. Resolves
 * with everything received until the server closes (or `timeoutMs`).
 */
export function sendRaw(
  port: number,
  bytes: Uint8Array | string,
  options: { halfClose?: boolean; timeoutMs?: number } = {},
): Promise<string> {
  return new Promise((resolve) => {
    const chunks: Buffer[] = [];
    const socket = net.connect({ port, host: '127.0.0.1', allowHalfOpen: true }, () => {
      socket.write(bytes);
      if (options.halfClose) socket.end();
    });
    const finish = () => resolve(Buffer.concat(chunks).toString('utf8'));
    const timer = setTimeout(() => socket.destroy(), options.timeoutMs ?? 5_000);
    socket.on('data', (chunk: Buffer) => chunks.push(chunk));
    // The service closed its side: it has said all it will.
    socket.on('end', () => socket.destroy());
    socket.on('close', () => {
      clearTimeout(timer);
      finish();
    });
    socket.on('error', () => undefined);
  });
}

/** Status, headers and body of a raw HTTP/1.1 answer ('' when there was none). */
export function parseRawAnswer(raw: string): Answer | undefined {
  const split = raw.indexOf('\r\n\r\n');
  const match = /^HTTP\/1\.[01] (\d{3})/.exec(raw);
  if (!match || split < 0) return undefined;
  const headers: Record<string, string> = {};
  for (const line of raw.slice(0, split).split('\r\n').slice(1)) {
    const colon = line.indexOf(':');
    if (colon > 0)
      headers[line.slice(0, colon).trim().toLowerCase()] = line.slice(colon + 1).trim();
  }
  let text = raw.slice(split + 4);
  if (headers['transfer-encoding'] === 'chunked') {
    let decoded = '';
    for (let at = 0; ;) {
      const end = text.indexOf('\r\n', at);
      const size = end < 0 ? 0 : parseInt(text.slice(at, end), 16);
      if (!(size > 0)) break;
      decoded += text.slice(end + 2, end + 2 + size);
      at = end + 2 + size + 2;
    }
    text = decoded;
  }
  return { status: Number(match[1]), headers, text };
}
