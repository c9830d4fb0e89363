import { appendFileSync, existsSync, readFileSync } from 'node:fs';

export interface CaughtMessage {
  id: number;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  messageId: string | null;
}

/** Caught messages in memory, appended to a JSON-lines file so they survive a restart. */
export class MessageStore {
  private messages: CaughtMessage[] = [];
  private nextId = 1;

  constructor(
    private readonly file: string,
    private readonly keep = 1000,
  ) {
    if (existsSync(file)) {
      for (const line of readFileSync(file, 'utf8').split('\n')) {
        if (!line.trim()) continue;
        try {
          this.messages.push(JSON.parse(line) as CaughtMessage);
        } catch {
          // A half-written last line after a crash: skip it.
        }
      }
      this.messages = this.messages.slice(-keep);
      this.nextId = (this.messages.at(-1)?.id ?? 0) + 1;
    }
  }

  add(message: Omit<CaughtMessage, 'id' | 'receivedAt'>): CaughtMessage {
    const stored = { id: this.nextId++, receivedAt: new Date().toISOString(), ...message };
    this.messages.push(stored);
    if (this.messages.length > this.keep) this.messages.shift();
    appendFileSync(this.file, `${JSON.stringify(stored)}\n`);
    return stored;
  }

  list(filter: { to?: string } = {}): CaughtMessage[] {
    const to = filter.to?.toLowerCase();
    return this.messages.filter((m) => !to || m.to.some((address) => address.toLowerCase() === to)).reverse();
  }

  get(id: number): CaughtMessage | undefined {
    return this.messages.find((m) => m.id === id);
  }

  clear(): void {
    this.messages = [];
    appendFileSync(this.file, '');
  }
}
