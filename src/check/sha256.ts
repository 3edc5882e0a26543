/** SHA-256 of a text's UTF-8 bytes, lower-case hex: the hash certificates record. */
import { createHash } from 'node:crypto';

export function sha256Hex(text: string): string {
  return createHash('sha256').update(text, 'utf8').digest('hex');
}
