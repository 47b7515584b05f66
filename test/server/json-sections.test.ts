import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ArchiveProblem } from '../../server/features/transfer/archive/archive-problem';
import { JsonSections, type JsonSectionEvent } from '../../server/features/transfer/archive/json-sections';

/** Puts the streamed pieces back together into one object, to compare with JSON.parse of the whole text. */
function rebuild(events: JsonSectionEvent[]): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const event of events) {
    const list = () => (Object.hasOwn(out, event.key) ? out[event.key] : (out[event.key] = [])) as unknown[];
    if (event.kind === 'value') out[event.key] = event.value;
    else if (event.kind === 'item') list().push(event.value);
    else list();
  }
  return out;
}

function read(pieces: string[], maxPiece = 10_000): Record<string, unknown> {
  const sections = new JsonSections('strapsift.json', maxPiece);
  const events: JsonSectionEvent[] = [];
  for (const piece of pieces) events.push(...sections.push(piece));
  events.push(...sections.end());
  return rebuild(events);
}

const SAMPLE = JSON.stringify(
  {
    format: 'strapsift-archive',
    version: 1,
    account: { name: 'Wren "the sifter" Halloway', note: 'braces } and ] and , in a string\\' },
    empty: [],
    notes: [{ id: 1, serial: 'MB 12121212 A', tags: ['a', ['b', { c: '}' }]] }, 2, 'three', null, true, -4.5e3],
  },
  null,
  1,
);

describe('JsonSections (streamed strapsift.json; JSON.parse of the whole text is the reference)', () => {
  it('when the text is split at any one place, then every member and array element comes out as JSON.parse reads them', () => {
    const whole = JSON.parse(SAMPLE);
    for (let at = 0; at <= SAMPLE.length; at++) expect(read([SAMPLE.slice(0, at), SAMPLE.slice(at)])).toEqual(whole);
  });

  it('when any JSON object of arrays and values is cut into random pieces, then it reads back equal', () => {
    const key = fc.string({ minLength: 1 }).filter((k) => k !== '__proto__');
    const value = fc.oneof(fc.string(), fc.integer(), fc.boolean(), fc.constant(null), fc.dictionary(key, fc.string()));
    fc.assert(
      fc.property(fc.dictionary(key, fc.oneof(fc.array(value), value)), fc.array(fc.nat(), { maxLength: 6 }), (object, cuts) => {
        const text = JSON.stringify(object);
        const bounds = [0, ...[...new Set(cuts.map((cut) => cut % (text.length + 1)))].sort((a, b) => a - b), text.length];
        const pieces = bounds.slice(1).map((end, i) => text.slice(bounds[i], end));
        expect(read(pieces)).toEqual(JSON.parse(text));
      }),
      { numRuns: 300 },
    );
  });

  it('when the text is broken, truncated, trailed or too large a record, then it is a problem, never a wrong read', () => {
    for (const bad of ['[1,2]', '{"a":[1,]}', '{"a":1,}', '{"a":1} x', '{"a":[1,2', '{"a":{"b":1}', '{"a" 1}', '{"a":[1 2]}']) {
      expect(() => read([bad]), bad).toThrow(ArchiveProblem);
    }
    expect(() => read(['{"notes":[{"serial":"', 'x'.repeat(200), '"}]}'], 100)).toThrow(/notes\[0\] is larger than 100 characters/);
  });
});
