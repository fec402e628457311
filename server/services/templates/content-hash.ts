import { createHash } from 'node:crypto';
import { canonicalJson } from '../../../shared/util/canonical-json';

/** SHA-256 of the spec's canonical JSON: equal specs, whatever their key order, share a hash. */
export function contentHash(spec: unknown): string {
  return createHash('sha256').update(canonicalJson(spec)).digest('hex');
}
