/**
 * A local stand-in for the shop's mail relay: accepts SMTP on 127.0.0.1 and keeps every message in memory,
 * readable over HTTP at GET /messages (newest first) and cleared with DELETE /messages.
 */
import { createServer } from 'node:http';
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';

interface CapturedMail {
  id: number;
  /** The Message-ID header: every attempt of one background job sends the same one. */
  messageId: string;
  to: string[];
  from: string;
  subject: string;
  text: string;
  html: string;
  /** Attachments with their bytes in base64, so a test can open a PDF that was sent. */
  attachments: { filename: string; contentType: string; size: number; contentBase64: string }[];
  receivedAt: string;
}

const smtpPort = Number(process.env.MAIL_FAKE_SMTP_PORT ?? 2525);
const httpPort = Number(process.env.MAIL_FAKE_HTTP_PORT ?? 2526);
const messages: CapturedMail[] = [];
let nextId = 1;

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS'],
  logger: false,
  onData(stream, session, callback) {
    simpleParser(stream)
      .then((parsed) => {
        messages.unshift({
          id: nextId++,
          messageId: parsed.messageId ?? '',
          to: session.envelope.rcptTo.map((rcpt) => rcpt.address),
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
          subject: parsed.subject ?? '',
          text: parsed.text ?? '',
          html: typeof parsed.html === 'string' ? parsed.html : '',
          attachments: parsed.attachments.map((attachment) => ({
            filename: attachment.filename ?? '',
            contentType: attachment.contentType,
            size: attachment.size,
            contentBase64: attachment.content.toString('base64'),
          })),
          receivedAt: new Date().toISOString(),
        });
        if (messages.length > 500) messages.length = 500;
        callback();
      })
      .catch((error: Error) => callback(error));
  },
});

const http = createServer((request, response) => {
  if (request.url?.startsWith('/messages') && request.method === 'GET') {
    response.writeHead(200, { 'content-type': 'application/json' });
    response.end(JSON.stringify(messages));
    return;
  }
  if (request.url?.startsWith('/messages') && request.method === 'DELETE') {
    messages.length = 0;
    response.writeHead(204).end();
    return;
  }
  response.writeHead(404).end();
});

smtp.listen(smtpPort, '127.0.0.1', () => {
  http.listen(httpPort, '127.0.0.1', () => {
    console.log(`mail fake: SMTP 127.0.0.1:${smtpPort}, messages at http://127.0.0.1:${httpPort}/messages`);
  });
});

function stop(): void {
  http.close();
  smtp.close(() => process.exit(0));
}
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
