import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import { getRequestListener } from '@hono/node-server';
import { SECURITY_HEADERS } from './security-headers.ts';

/** The methods some route of the service accepts. */
const SERVER_METHODS = 'GET, HEAD, POST, PUT, DELETE, OPTIONS';

/** Writes an answer in the one error shape with the security headers, then closes the connection. */
function refuse(outgoing: ServerResponse, status: number, message: string): void {
  const body = JSON.stringify({ error: message, issues: [] });
  outgoing.writeHead(status, {
    ...SECURITY_HEADERS,
    'Content-Type': 'application/json',
    'Content-Length': Buffer.byteLength(body),
    Connection: 'close',
  });
  outgoing.end(outgoing.req.method === 'HEAD' ? undefined : body);
}

/** An answer in the error shape for a request the adapter could not turn into a fetch Request. */
const refusal = (status: number, message: string): Response =>
  new Response(JSON.stringify({ error: message, issues: [] }), {
    status,
    headers: { ...SECURITY_HEADERS, 'Content-Type': 'application/json' },
  });

export interface NodeServerOptions {
  readonly fetch: (request: Request) => Response | Promise<Response>;
  /** The address listened on; the URL host of an HTTP/1.0 request without Host. */
  readonly hostname: string;
}

/**
 * The service's Node HTTP server. Node itself answers a few requests before any app code runs
 * (HTTP/1.1 without Host, an Expect it does not know) with a bare status line, and the hono
 * adapter does the same for targets it cannot read (`OPTIONS *`, a Host that is not a host
 * name, a backslash in the path); here each of those gets the one error shape and the
 * security headers like every other answer.
 */
export function createNodeServer(options: NodeServerOptions): Server {
  // hono answers HEAD by running GET and copying its answer without the body; on the Node
  // adapter's lightweight Response that copy takes the headers the handler set, not those
  // middleware added after (the security headers). So HEAD is run as GET here, keeping its headers.
  const fetch = async (request: Request): Promise<Response> => {
    if (request.method !== 'HEAD') return options.fetch(request);
    const answer = await options.fetch(
      new Request(request.url, { method: 'GET', headers: request.headers }),
    );
    return new Response(null, { status: answer.status, headers: answer.headers });
  };
  const listener = getRequestListener(fetch, {
    hostname: options.hostname,
    errorHandler: (error) =>
      refusal(
        400,
        `the request target or Host could not be read (${error instanceof Error ? error.message : 'unreadable'}); expected a path starting with "/" and a host name`,
      ),
  });
  // RFC 9112 section 3.2: a server must answer 400 to an HTTP/1.1 request without Host; Node
  // would, without our headers, so it is checked here instead.
  const server = createServer(
    { requireHostHeader: false },
    (incoming: IncomingMessage, outgoing: ServerResponse) => {
      if (incoming.headers.host === undefined && incoming.httpVersion === '1.1') {
        refuse(outgoing, 400, 'expected a Host header: HTTP/1.1 requires one');
        return;
      }
      // "OPTIONS *" asks about the server as a whole (RFC 9110 section 9.3.7): the methods it knows.
      if (incoming.method === 'OPTIONS' && incoming.url === '*') {
        outgoing.writeHead(204, { ...SECURITY_HEADERS, Allow: SERVER_METHODS });
        outgoing.end();
        return;
      }
      void listener(incoming, outgoing);
    },
  );
  // RFC 9110 section 10.1.1: an expectation the server cannot meet is answered 417.
  server.on('checkExpectation', (incoming: IncomingMessage, outgoing: ServerResponse) => {
    refuse(
      outgoing,
      417,
      `the expectation "${incoming.headers.expect ?? ''}" is not supported; expected none or "100-continue"`,
    );
  });
  return server;
}
