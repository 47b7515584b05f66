import { describe, expect, it } from 'vitest';
import { ACCEPTANCE, acceptFrame, initialAcceptance, type AcceptanceState } from '../../shared/ocr/acceptance';
import type { SerialRead } from '../../shared/ocr/serial-from-text';

function read(serial: string, confidence: number, digitConfidence = Array(8).fill(confidence) as number[]): SerialRead {
  const digits = serial.replace(/\D/g, '');
  return { serial, prefix: serial.slice(0, serial.search(/\d/)), digits, suffix: serial.slice(-1), star: false, digitConfidence, confidence, trimmed: false };
}

function run(frames: (SerialRead | null)[], start: AcceptanceState = initialAcceptance) {
  let state = start;
  return frames.map((frame) => {
    const next = acceptFrame(state, frame);
    state = next.state;
    return next.verdict.kind;
  });
}

describe('acceptFrame', () => {
  it('when two frames in a row agree at a middling confidence, then the second accepts the serial', () => {
    expect(run([read('MB12345678C', 0.7), read('MB12345678C', 0.7)])).toEqual(['tentative', 'accept']);
  });

  it('when one frame is very sure, then it accepts alone', () => {
    expect(run([read('MB12345678C', ACCEPTANCE.single)])).toEqual(['accept']);
  });

  it('when the same note stays under the camera, even across a blurred frame, then it is accepted once', () => {
    const note = read('MB12345678C', 0.95);
    expect(run([note, note, null, note, note])).toEqual(['accept', 'held', 'nothing', 'held', 'held']);
  });

  it('when two frames disagree, then nothing is accepted until two agree', () => {
    expect(run([read('MB12345678C', 0.7), read('MB12345679C', 0.7), read('MB12345679C', 0.7)])).toEqual(['tentative', 'tentative', 'accept']);
  });

  it('when frames agree but each is below the agreement floor, then the serial stays tentative', () => {
    const weak = read('MB12345678C', ACCEPTANCE.agree - 0.01);
    expect(run([weak, weak, weak])).toEqual(['tentative', 'tentative', 'tentative']);
  });

  it('when a digit is unsure in an accepted serial, then its position is reported for the keypad', () => {
    const confidences = [0.99, 0.99, 0.5, 0.99, 0.99, 0.99, 0.99, 0.99];
    const first = acceptFrame(initialAcceptance, read('MB12345678C', 0.7, confidences));
    const second = acceptFrame(first.state, read('MB12345678C', 0.7, confidences));
    expect(second.verdict).toMatchObject({ kind: 'accept', unsure: [3] });
  });

  it('when the next different note follows, then it is accepted too', () => {
    expect(run([read('MB12345678C', 0.95), read('MB12345678C', 0.95), read('MB87654321D', 0.95)])).toEqual(['accept', 'held', 'accept']);
  });
});

describe('acceptFrame near the last accepted serial', () => {
  it('when frames read a digit off, or the digits shifted by one, from the note just accepted, then three agreeing frames are needed', () => {
    expect(run([read('MB12345678C', 0.95), read('MB12345670C', 0.95), read('MB12345670C', 0.95)])).toEqual(['accept', 'tentative', 'tentative']);
    expect(run([read('FD18636534J', 0.95), read('FD86365343J', 0.95), read('FD86365343J', 0.95)])).toEqual(['accept', 'tentative', 'tentative']);
    // The next note of a sequential strap: three agreeing frames take it.
    const next = read('MB12345679C', 0.95);
    expect(run([read('MB12345678C', 0.95), next, next, next])).toEqual(['accept', 'tentative', 'tentative', 'accept']);
  });
});

describe('acceptFrame over three frames', () => {
  it('when one spoiled frame falls between two that agree, then the serial is still accepted (two of the last three)', () => {
    expect(run([read('MB12345678C', 0.7), read('MB12345678C', 0.5), read('MB12345678C', 0.7)])).toEqual(['tentative', 'tentative', 'accept']);
    expect(run([read('MB12345678C', 0.7), null, read('MB12345678C', 0.7)])).toEqual(['tentative', 'nothing', 'accept']);
  });

  it('when two agreeing frames are further apart than three, then they do not count together', () => {
    const other = read('MB87654321D', 0.5);
    expect(run([read('MB12345678C', 0.7), other, other, read('MB12345678C', 0.7)])).toEqual(['tentative', 'tentative', 'tentative', 'tentative']);
  });

  it('when the serial has a one-letter prefix (a two-letter one may have lost its thin first letter), then three agreeing frames are needed', () => {
    const short = read('C38838838K', 0.9);
    expect(run([short, short, short])).toEqual(['tentative', 'tentative', 'accept']);
    // A rival with the letter between them resets the count; a very sure frame still accepts alone.
    expect(run([short, short, read('IC38838838K', 0.9), short])).toEqual(['tentative', 'tentative', 'tentative', 'tentative']);
    expect(run([read('C38838838K', ACCEPTANCE.single)])).toEqual(['accept']);
  });
});
