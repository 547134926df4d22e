/**
 * The local SMTP catcher that `npm start` and `npm test` run on 127.0.0.1:
 * it accepts every message (no auth, no TLS: loopback only) and stores it in
 * the caught-mail directory instead of delivering it.
 */
import { SMTPServer } from 'smtp-server';
import { simpleParser, type AddressObject } from 'mailparser';
import { CaughtMailStore } from './caught-mail-store';

export interface RunningMailCatcher {
  port: number;
  stop(): Promise<void>;
}

/** Largest message the catcher accepts [bytes]; the app only sends short text mail. */
const MAX_MESSAGE_BYTES = 1024 * 1024;

function addresses(value: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(value) ? value : value ? [value] : [];
  return list.flatMap((entry) => entry.value.map((address) => address.address ?? '')).filter(Boolean);
}

export async function startMailCatcher(options: { port: number; dir: string }): Promise<RunningMailCatcher> {
  const store = new CaughtMailStore(options.dir);
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['AUTH', 'STARTTLS'],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream).then(
        (parsed) => {
          store.save({ from: addresses(parsed.from)[0] ?? '', to: addresses(parsed.to), subject: parsed.subject ?? '', text: parsed.text ?? '' });
          callback();
        },
        (error: Error) => callback(error),
      );
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port, '127.0.0.1', () => resolve());
  });
  return {
    port: options.port,
    stop: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
