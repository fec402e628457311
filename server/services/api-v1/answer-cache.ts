import { LRUCache } from 'lru-cache';

/**
 * Finished answers of the public API, kept by their ETag. An answer about a published version
 * is a pure function of its spec (immutable) and the request, and the ETag names both, so a
 * configurator or product page that asks the same question again and again is answered from
 * here without solving or serialising. Bounded by bytes, least recently used out first.
 */
export class AnswerCache {
  private readonly cache: LRUCache<string, string>;

  constructor(maxBytes = 16 * 1024 * 1024) {
    this.cache = new LRUCache<string, string>({ maxSize: maxBytes, sizeCalculation: (body, tag) => body.length + tag.length });
  }

  get(tag: string): string | undefined {
    return this.cache.get(tag);
  }

  /** Keeps an answer; one bigger than the whole cache is not kept. */
  set(tag: string, body: string): void {
    this.cache.set(tag, body);
  }

  get size(): number {
    return this.cache.size;
  }
}
