import { simpleParser, type AddressObject } from 'mailparser';
import pg from 'pg';
import { SMTPServer } from 'smtp-server';

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((a) => a.value.map((v) => v.address ?? '')).filter(Boolean);
}

/**
 * A loopback SMTP server that keeps every message in PostgreSQL so admins can read it in the app:
 * invitations and password resets work end to end without any outside service.
 */
export async function startMailCatcher(options: { port: number; databaseUrl: string }) {
  const pool = new pg.Pool({ connectionString: options.databaseUrl, max: 2 });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    size: 10 * 1024 * 1024,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) =>
          pool.query(
            'insert into caught_mail (from_address, to_addresses, subject, text_body, html_body) values ($1, $2, $3, $4, $5)',
            [
              addresses(mail.from)[0] ?? '',
              JSON.stringify(addresses(mail.to)),
              mail.subject ?? '',
              mail.text ?? '',
              typeof mail.html === 'string' ? mail.html : null,
            ],
          ),
        )
        .then(() => callback(), (error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port, '127.0.0.1', () => resolve());
  });
  return {
    port: options.port,
    stop: async () => {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await pool.end();
    },
  };
}
