// A local mail catcher for development and tests: an SMTP server that keeps every message in
// memory, and a small HTTP API to read them, clear them and simulate an SMTP outage.
//   GET /messages      → newest first: [{ id, from, to, subject, date, text, html, headers }]
//   DELETE /messages   → forgets every message
//   POST /control      → {"accept": false} answers every SMTP session with 421; {"accept": true} restores
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { Readable } from 'node:stream';
import { simpleParser, type AddressObject, type HeaderValue } from 'mailparser';
import { SMTPServer, type SMTPServerError, type SMTPServerSession } from 'smtp-server';

const HOST = '127.0.0.1';
const MAX_MESSAGES = 500;
const MAX_MESSAGE_BYTES = 10 * 1024 * 1024;

export type CaughtMessage = {
  id: string;
  from: string;
  to: string[];
  subject: string;
  date: string;
  text: string;
  html: string | null;
  headers: Record<string, string>;
};

const messages: CaughtMessage[] = [];
let nextId = 1;
let accepting = true;

function outageError(): SMTPServerError {
  const error: SMTPServerError = new Error(
    'Service not available (mail catcher outage simulation)',
  );
  error.responseCode = 421;
  return error;
}

function isAddressObject(value: unknown): value is AddressObject {
  return typeof value === 'object' && value !== null && 'text' in value && 'value' in value;
}

/** Turns one of mailparser's parsed header values back into readable text. */
function headerText(value: HeaderValue | HeaderValue[] | unknown): string {
  if (Array.isArray(value)) return value.map(headerText).join(', ');
  if (typeof value === 'string') return value;
  if (value instanceof Date) return value.toISOString();
  if (isAddressObject(value)) return value.text;
  if (typeof value === 'object' && value !== null && 'value' in value) {
    const { value: main, params } = value as { value: string; params?: Record<string, string> };
    const extras = Object.entries(params ?? {}).map(([key, param]) => `; ${key}=${param}`);
    return `${main}${extras.join('')}`;
  }
  return JSON.stringify(value);
}

async function storeMessage(stream: Readable, session: SMTPServerSession) {
  const parsed = await simpleParser(stream);
  const headers: Record<string, string> = {};
  for (const [name, value] of parsed.headers) headers[name] = headerText(value);
  messages.unshift({
    id: String(nextId++),
    from: parsed.from?.text ?? (session.envelope.mailFrom ? session.envelope.mailFrom.address : ''),
    // The envelope says who the message was actually delivered to, Bcc included.
    to: session.envelope.rcptTo.map((recipient) => recipient.address),
    subject: parsed.subject ?? '',
    date: (parsed.date ?? new Date()).toISOString(),
    text: parsed.text ?? '',
    html: parsed.html || null,
    headers,
  });
  messages.length = Math.min(messages.length, MAX_MESSAGES);
}

const smtp = new SMTPServer({
  // Plain local SMTP: no TLS to negotiate; any credentials (or none) are welcome.
  disabledCommands: ['STARTTLS'],
  authOptional: true,
  allowInsecureAuth: true,
  size: MAX_MESSAGE_BYTES,
  logger: false,
  onConnect(_session, callback) {
    callback(accepting ? undefined : outageError());
  },
  onAuth(auth, _session, callback) {
    callback(null, { user: auth.username ?? 'anyone' });
  },
  onMailFrom(_address, _session, callback) {
    // A pooled connection opened before the outage began is refused here.
    callback(accepting ? undefined : outageError());
  },
  onData(stream, session, callback) {
    storeMessage(stream, session).then(
      () => callback(),
      (error: Error) => callback(error),
    );
  },
});

function sendJson(res: ServerResponse, status: number, body: unknown) {
  res.writeHead(status, { 'content-type': 'application/json; charset=utf-8' });
  res.end(JSON.stringify(body));
}

async function readJson(req: IncomingMessage): Promise<unknown> {
  let raw = '';
  for await (const chunk of req) raw += chunk;
  return raw ? JSON.parse(raw) : {};
}

async function handle(req: IncomingMessage, res: ServerResponse) {
  const { pathname } = new URL(req.url ?? '/', `http://${HOST}`);
  if (pathname === '/messages' && req.method === 'GET') return sendJson(res, 200, messages);
  if (pathname === '/messages' && req.method === 'DELETE') {
    messages.length = 0;
    return sendJson(res, 200, { deleted: true });
  }
  if (pathname === '/control' && req.method === 'GET')
    return sendJson(res, 200, { accept: accepting });
  if (pathname === '/control' && req.method === 'POST') {
    const body = await readJson(req).catch(() => undefined);
    const accept = (body as { accept?: unknown } | undefined)?.accept;
    if (typeof accept !== 'boolean') {
      return sendJson(res, 400, { error: 'send {"accept": true} or {"accept": false}' });
    }
    accepting = accept;
    return sendJson(res, 200, { accept: accepting });
  }
  return sendJson(res, 404, { error: 'not found' });
}

const http = createServer((req, res) => {
  handle(req, res).catch((error: Error) => sendJson(res, 500, { error: error.message }));
});

function portFromEnv(name: string, fallback: number): number {
  const port = Number(process.env[name] ?? fallback);
  if (!Number.isInteger(port) || port <= 0 || port > 65535) {
    throw new Error(`${name} must be a TCP port number, got ${process.env[name]}`);
  }
  return port;
}

function listen(server: { listen: SMTPServer['listen'] }, port: number): Promise<void> {
  return new Promise((resolve, reject) => {
    const listener = server.listen(port, HOST, () => resolve());
    listener.once('error', reject);
  });
}

const smtpPort = portFromEnv('MAIL_CATCHER_SMTP_PORT', 2525);
const httpPort = portFromEnv('MAIL_CATCHER_HTTP_PORT', 2526);

try {
  await listen(smtp, smtpPort);
  await new Promise<void>((resolve, reject) => {
    http.once('error', reject);
    http.listen(httpPort, HOST, () => resolve());
  });
} catch (error) {
  console.error(`mail catcher: could not listen: ${(error as Error).message}`);
  process.exit(1);
}
console.log(`mail catcher: smtp ${HOST}:${smtpPort}, http ${HOST}:${httpPort}`);

function shutDown() {
  http.close();
  smtp.close(() => process.exit(0));
  // Open SMTP sessions would otherwise hold the process for smtp-server's close timeout.
  setTimeout(() => process.exit(0), 1000).unref();
}
process.on('SIGTERM', shutDown);
process.on('SIGINT', shutDown);
