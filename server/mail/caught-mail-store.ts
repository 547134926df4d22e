/**
 * Caught mail on disk: one JSON file per message in MAIL_CATCHER_DIR. A
 * directory (not memory) because the catcher runs in the bootstrap process
 * while the API that shows the mail may run in another.
 */
import { mkdirSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { randomBytes } from 'node:crypto';

export interface CaughtMail {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  receivedAt: string;
}

/** Oldest messages beyond this are dropped, so a long-running `npm start` does not fill the disk. */
const KEEP_MESSAGES = 200;

export class CaughtMailStore {
  constructor(private readonly dir: string) {}

  save(mail: Omit<CaughtMail, 'id' | 'receivedAt'>): CaughtMail {
    mkdirSync(this.dir, { recursive: true });
    const receivedAt = new Date().toISOString();
    // Sortable by name: time first, then randomness for messages in the same millisecond.
    const id = `${Date.now().toString().padStart(15, '0')}-${randomBytes(4).toString('hex')}`;
    const caught: CaughtMail = { id, receivedAt, ...mail };
    writeFileSync(join(this.dir, `${id}.json`), JSON.stringify(caught));
    for (const old of this.fileNames().slice(0, -KEEP_MESSAGES)) rmSync(join(this.dir, old), { force: true });
    return caught;
  }

  /** Newest first. */
  list(): CaughtMail[] {
    return this.fileNames()
      .reverse()
      .map((name) => JSON.parse(readFileSync(join(this.dir, name), 'utf8')) as CaughtMail);
  }

  clear(): void {
    rmSync(this.dir, { recursive: true, force: true });
  }

  private fileNames(): string[] {
    try {
      return readdirSync(this.dir).filter((name) => name.endsWith('.json')).sort();
    } catch {
      // No directory yet means no mail caught yet.
      return [];
    }
  }
}
