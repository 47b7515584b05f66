import { createHash } from 'node:crypto';
import { v3, v5, validate, version } from 'uuid';
import { describe, expect, it } from 'vitest';
import { IMPORT_NAMESPACE } from '../../server/features/transfer/import.service';

const DNS_NAMESPACE = '6ba7b810-9dad-11d1-80b4-00c04fd430c8';

/** RFC 9562 §5.5 by hand with node:crypto, as the hand-written helper the uuid package replaced did it. */
function sha1NameBased(name: string, namespace: string): string {
  const hash = createHash('sha1').update(Buffer.from(namespace.replace(/-/g, ''), 'hex')).update(name, 'utf8').digest();
  hash[6] = (hash[6]! & 0x0f) | 0x50;
  hash[8] = (hash[8]! & 0x3f) | 0x80;
  const hex = hash.subarray(0, 16).toString('hex');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}

describe('name-based ids of imported notes (the uuid package)', () => {
  // RFC 9562 (which obsoletes RFC 4122), Appendix A: the DNS namespace (RFC 4122 Appendix C) and the name
  // "www.example.com" give the v3 example in A.2 and the v5 example in A.4.
  it('when given the RFC 9562 example name in the DNS namespace, then v5 and v3 give the published example values', () => {
    expect(v5.DNS).toBe(DNS_NAMESPACE);
    expect(v5('www.example.com', DNS_NAMESPACE)).toBe('2ed6657d-e927-568b-95e1-2665a8aea6a2');
    expect(v3('www.example.com', DNS_NAMESPACE)).toBe('5df41881-3aed-3515-88a7-2f4a814cf09e');
  });

  it('when an import row is named, then its id is a version-5 UUID equal to the SHA-1 construction, so files imported before still match', () => {
    for (const name of ['u1|12345678|ML|C|false|2026-03-02T10:00:00.000Z|1', 'u2|00000417|||true||2', 'ünïcode|★']) {
      const id = v5(name, IMPORT_NAMESPACE);
      expect(validate(id)).toBe(true);
      expect(version(id)).toBe(5);
      expect(id).toBe(sha1NameBased(name, IMPORT_NAMESPACE));
    }
  });

  it('when two names differ in one field, then their ids differ; the same name always gives the same id', () => {
    expect(v5('a|1', IMPORT_NAMESPACE)).toBe(v5('a|1', IMPORT_NAMESPACE));
    expect(v5('a|1', IMPORT_NAMESPACE)).not.toBe(v5('a|2', IMPORT_NAMESPACE));
  });
});
