import { ArchiveProblem } from './archive-problem';

/** One piece of a top-level JSON object: a whole member value, or one element of a member that is an array. */
export type JsonSectionEvent =
  | { kind: 'value'; key: string; value: unknown }
  | { kind: 'item'; key: string; index: number; value: unknown }
  | { kind: 'end-array'; key: string; count: number };

type State = 'start' | 'key' | 'key-string' | 'colon' | 'value' | 'array' | 'array-next' | 'capture' | 'after-value' | 'done';

const WHITESPACE = new Set([' ', '\t', '\n', '\r']);

/**
 * Reads a top-level JSON object as it streams in and hands out each member, and each element of a member
 * that is an array, as soon as it is complete. Only one element is ever held (at most `maxPiece`
 * characters), so a file with a million notes is read in the memory of one note. Every piece goes through
 * JSON.parse, so the grammar inside a piece is the standard one; this class only finds where pieces end.
 */
export class JsonSections {
  private state: State = 'start';
  private key = '';
  private keyText = '';
  private inArray = false;
  /** Members of the top-level object so far: `{}` is allowed, `{"a":1,}` is not. */
  private members = 0;
  private index = 0;
  private piece: string[] = [];
  private pieceLength = 0;
  private depth = 0;
  private inString = false;
  private escaped = false;
  private readonly events: JsonSectionEvent[] = [];

  constructor(
    private readonly file: string,
    private readonly maxPiece: number,
  ) {}

  /** Feeds text; answers the pieces completed by it, in order. */
  push(text: string): JsonSectionEvent[] {
    let from = 0;
    for (let i = 0; i < text.length; i++) {
      const c = text[i]!;
      switch (this.state) {
        case 'capture': {
          if (this.inString) {
            if (this.escaped) this.escaped = false;
            else if (c === '\\') this.escaped = true;
            else if (c === '"') this.inString = false;
            continue;
          }
          if (c === '"') this.inString = true;
          else if (c === '{' || c === '[') this.depth++;
          else if (c === '}' || c === ']' || c === ',') {
            if (this.depth > 0 && c !== ',') this.depth--;
            else if (this.depth === 0) {
              this.append(text.slice(from, i));
              this.finishPiece();
              i--; // the delimiter belongs to the enclosing array or object
            }
          }
          continue;
        }
        case 'key-string': {
          if (this.escaped) this.escaped = false;
          else if (c === '\\') this.escaped = true;
          else if (c === '"') {
            this.key = String(this.parse(`"${this.keyText}"`, 'a member name'));
            this.keyText = '';
            this.state = 'colon';
            continue;
          }
          this.keyText += c;
          if (this.keyText.length > 200) throw this.problem('a member name is too long');
          continue;
        }
        default:
          break;
      }
      if (WHITESPACE.has(c)) continue;
      switch (this.state) {
        case 'start':
          if (c !== '{') throw this.problem('must be one JSON object');
          this.state = 'key';
          break;
        case 'key':
          if (c === '}' && this.members === 0) this.state = 'done';
          else if (c === '"') this.state = 'key-string';
          else throw this.problem(`expected a member name, found "${c}"`);
          break;
        case 'colon':
          if (c !== ':') throw this.problem(`expected ":" after "${this.key}"`);
          this.members++;
          this.state = 'value';
          break;
        case 'value':
          if (c === '[') {
            this.inArray = true;
            this.index = 0;
            this.state = 'array';
          } else {
            from = i;
            this.beginPiece(c);
          }
          break;
        case 'array':
        case 'array-next':
          if (c === ']' && this.state === 'array') {
            this.events.push({ kind: 'end-array', key: this.key, count: this.index });
            this.inArray = false;
            this.state = 'after-value';
          } else if (c === ']' || c === ',') throw this.problem(`"${this.key}" has a misplaced "${c}"`);
          else {
            from = i;
            this.beginPiece(c);
          }
          break;
        case 'after-value':
          if (this.inArray) {
            if (c === ',') this.state = 'array-next';
            else if (c === ']') {
              this.events.push({ kind: 'end-array', key: this.key, count: this.index });
              this.inArray = false;
            } else throw this.problem(`"${this.key}" has "${c}" where "," or "]" belongs`);
          } else if (c === ',') {
            this.state = 'key';
          } else if (c === '}') this.state = 'done';
          else throw this.problem(`expected "," or "}" after "${this.key}", found "${c}"`);
          break;
        case 'done':
          throw this.problem('has more after its closing "}"');
        default:
          break;
      }
    }
    if (this.state === 'capture') this.append(text.slice(from));
    return this.events.splice(0);
  }

  /** The end of the text: anything left open is a truncated or broken file. */
  end(): JsonSectionEvent[] {
    if (this.state === 'capture' && !this.inArray && this.depth === 0 && !this.inString) this.finishPiece();
    if (this.state !== 'done') throw this.problem('ends part-way (the file is cut short or broken)');
    return this.events.splice(0);
  }

  private beginPiece(first: string): void {
    if (first === '}' || first === ']') throw this.problem(`"${this.key}" has a misplaced "${first}"`);
    this.state = 'capture';
    this.piece = [];
    this.pieceLength = 0;
    // A string ends at its closing quote, an object or array at its matching bracket, a number or
    // literal at the next delimiter; the piece itself ends at the first delimiter outside all of them.
    this.inString = first === '"';
    this.escaped = false;
    this.depth = first === '{' || first === '[' ? 1 : 0;
  }

  private append(text: string): void {
    if (!text) return;
    this.pieceLength += text.length;
    if (this.pieceLength > this.maxPiece) {
      throw this.problem(this.inArray ? `${this.key}[${this.index}] is larger than ${this.maxPiece} characters` : `"${this.key}" is too large`);
    }
    this.piece.push(text);
  }

  private finishPiece(): void {
    const value = this.parse(this.piece.join(''), this.inArray ? `${this.key}[${this.index}]` : `"${this.key}"`);
    this.piece = [];
    this.pieceLength = 0;
    if (this.inArray) this.events.push({ kind: 'item', key: this.key, index: this.index++, value });
    else this.events.push({ kind: 'value', key: this.key, value });
    this.state = 'after-value';
  }

  private parse(text: string, what: string): unknown {
    try {
      return JSON.parse(text);
    } catch {
      throw this.problem(`${what} is not valid JSON`);
    }
  }

  private problem(message: string): ArchiveProblem {
    return new ArchiveProblem(this.file, message);
  }
}
