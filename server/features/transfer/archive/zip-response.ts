import type { Response } from 'express';
import { AsyncZipDeflate, Zip, ZipDeflate, ZipPassThrough } from 'fflate';

/** Text is handed to the compressor in pieces at least this large, so each piece comes back as output. */
const PIECE = 64 * 1024;
/** Pieces in the compressor's queue before the writer waits: bounds memory whatever the archive's size. */
const IN_FLIGHT = 2;

/**
 * A zip written straight into an HTTP response with fflate's streaming Zip. Waits whenever the socket is
 * full or the compressor (a worker thread, AsyncZipDeflate) is behind, so an archive of any size passes
 * through a few hundred kilobytes of memory.
 */
export class ZipResponse {
  private readonly zip: Zip;
  private blocked = false;
  private failed: Error | null = null;
  private finished = false;
  private wakers: Array<() => void> = [];

  constructor(private readonly res: Response) {
    this.zip = new Zip((error, chunk, final) => {
      if (error) return this.fail(error);
      if (this.res.destroyed) return this.fail(new Error('client went away'));
      if (!this.res.write(chunk)) this.blocked = true;
      if (final) {
        this.finished = true;
        this.res.end();
      }
      this.wake();
    });
    res.on('drain', () => {
      this.blocked = false;
      this.wake();
    });
    res.on('close', () => {
      if (!this.finished) this.fail(new Error('client went away'));
    });
  }

  /** A small file compressed at once (the README). */
  addSmall(name: string, text: string): void {
    const file = new ZipDeflate(name, { level: 6 });
    this.zip.add(file);
    file.push(Buffer.from(text, 'utf8'), true);
  }

  /** Bytes that are compressed already (photos): stored as they are. */
  async addStored(name: string, bytes: Uint8Array): Promise<void> {
    const file = new ZipPassThrough(name);
    this.zip.add(file);
    file.push(bytes, true);
    await this.until(() => !this.blocked);
  }

  /** A large text file written in pieces; call `write` as often as needed, then `end`. */
  text(name: string): { write(text: string): Promise<void>; end(): Promise<void> } {
    const file = new AsyncZipDeflate(name, { level: 6 });
    this.zip.add(file);
    let pushes = 0;
    let outputs = 0;
    const relay = file.ondata;
    file.ondata = (error, chunk, final) => {
      outputs += 1;
      relay(error, chunk, final);
    };
    let pending: string[] = [];
    let size = 0;
    const push = async (final: boolean) => {
      const bytes = Buffer.from(pending.join(''), 'utf8');
      pending = [];
      size = 0;
      pushes += 1;
      file.push(bytes, final);
      // Every piece of PIECE bytes or more comes back as at least one output (fflate's deflate emits
      // once 8 KB are buffered), so `outputs` catches up with `pushes` as the worker works through them.
      await this.until(() => outputs >= pushes - (final ? 0 : IN_FLIGHT) && !this.blocked);
    };
    return {
      write: async (text) => {
        pending.push(text);
        size += text.length;
        if (size >= PIECE) await push(false);
      },
      end: () => push(true),
    };
  }

  async end(): Promise<void> {
    this.zip.end();
    await this.until(() => this.finished);
  }

  /** Stops the compressor's workers; the response is cut short. */
  abort(): void {
    this.zip.terminate();
  }

  private fail(error: Error): void {
    this.failed ??= error;
    this.wake();
  }

  private wake(): void {
    const wakers = this.wakers;
    this.wakers = [];
    for (const wake of wakers) wake();
  }

  private async until(ready: () => boolean): Promise<void> {
    for (;;) {
      if (this.failed) throw this.failed;
      if (ready()) return;
      await new Promise<void>((resolve) => this.wakers.push(resolve));
    }
  }
}
