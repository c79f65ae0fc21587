import type { Duplex } from 'node:stream';
import { CONTENT_SECURITY_POLICY, REFERRER_POLICY } from './security-headers.ts';

/** What Node's HTTP parser refused, as status and message (codes from llhttp and node:http). */
function refusal(code: string | undefined): { status: number; reason: string; message: string } {
  switch (code) {
    case 'HPE_HEADER_OVERFLOW':
      return {
        status: 431,
        reason: 'Request Header Fields Too Large',
        message: 'the request line and headers are over the limit of 16 KiB (a very long URL?)',
      };
    case 'HPE_INVALID_EOF_STATE':
      return {
        status: 400,
        reason: 'Bad Request',
        message: 'the request was cut short: the connection closed before all of it arrived',
      };
    case 'ERR_HTTP_REQUEST_TIMEOUT':
      return {
        status: 408,
        reason: 'Request Timeout',
        message: 'the request did not arrive in time',
      };
    default:
      return {
        status: 400,
        reason: 'Bad Request',
        message: `the request is not valid HTTP/1.1 (${code ?? 'unreadable'})`,
      };
  }
}

/**
 * Answers a request Node's HTTP parser refused before the app saw it (malformed request line
 * or headers, headers over 16 KiB, a body cut short) in the service's one error shape with its
 * security headers, instead of Node's bare status line. Installed as the server's
 * 'clientError' listener; as Node's default does, it writes only to a socket with nothing
 * written yet, then closes it.
 */
export function answerClientError(
  error: NodeJS.ErrnoException,
  socket: Duplex & { bytesWritten?: number },
): void {
  if (error.code === 'ECONNRESET' || !socket.writable || (socket.bytesWritten ?? 0) > 0) {
    socket.destroy();
    return;
  }
  const { status, reason, message } = refusal(error.code);
  const body = JSON.stringify({ error: message, issues: [] });
  socket.end(
    `HTTP/1.1 ${status} ${reason}\r\n` +
      'Content-Type: application/json\r\n' +
      `Content-Length: ${Buffer.byteLength(body)}\r\n` +
      `Content-Security-Policy: ${CONTENT_SECURITY_POLICY}\r\n` +
      `X-Content-Type-Options: nosniff\r\nX-Frame-Options: DENY\r\nReferrer-Policy: ${REFERRER_POLICY}\r\nConnection: close\r\n\r\n` +
      body,
  );
}
