import { CommunityFileProblem } from './file-problem.ts';

/**
 * Text of a file: UTF-8 with or without a byte-order mark, or UTF-16 when it starts with a
 * UTF-16 byte-order mark (spreadsheets' "Unicode text" export). Anything else is refused with
 * the line of the first byte that is not UTF-8, rather than read into wrong letters.
 */
export function decodeText(bytes: Uint8Array, fileName: string): string {
  if (bytes[0] === 0xff && bytes[1] === 0xfe)
    return new TextDecoder('utf-16le').decode(bytes.subarray(2));
  if (bytes[0] === 0xfe && bytes[1] === 0xff)
    return new TextDecoder('utf-16be').decode(bytes.subarray(2));
  try {
    return new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
  } catch {
    const loose = new TextDecoder('utf-8').decode(bytes);
    const at = loose.indexOf('\uFFFD');
    const line = loose.slice(0, Math.max(at, 0)).split('\n').length;
    throw new CommunityFileProblem(
      `${fileName} [line ${line}]: expected UTF-8 text, found a byte that is not UTF-8 (the file is in another encoding; save it as "CSV UTF-8" or UTF-8 text)`,
    );
  }
}
