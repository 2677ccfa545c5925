import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { createRequire } from 'node:module';
import type { AddressInfo } from 'node:net';

/**
 * The browser tests' mail server: smtp-server (the nodemailer project's SMTP server library) on a free
 * loopback port, no TLS or auth, that writes every message it receives, whole, to its own folder
 * (0001.eml, 0002.eml, …) so the test files, which run in other processes, can read them.
 */
export async function startSmtpCapture(): Promise<{ url: string; dir: string; close: () => Promise<void> }> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-e2e-mail-'));
  const { SMTPServer } = createRequire(__filename)('smtp-server');
  let seq = 0;
  const server = new SMTPServer({
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    size: 10 * 1024 * 1024,
    onData(stream: NodeJS.ReadableStream, _session: unknown, callback: (err?: Error) => void) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('end', () => {
        const name = path.join(dir, `${String(++seq).padStart(4, '0')}.eml`);
        fs.writeFile(`${name}.part`, Buffer.concat(chunks), (err) => (err ? callback(err) : fs.rename(`${name}.part`, name, (e) => callback(e ?? undefined))));
      });
    },
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = (server.server as { address(): AddressInfo }).address();
  return {
    url: `smtp://127.0.0.1:${port}`,
    dir,
    close: () =>
      new Promise<void>((resolve) =>
        server.close(() => {
          fs.rmSync(dir, { recursive: true, force: true });
          resolve();
        }),
      ),
  };
}
