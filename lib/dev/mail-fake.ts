// A local stand-in for an SMTP provider: accepts every message on 127.0.0.1 and keeps it
// in the mail_outbox table, where /api/dev/outbox and /dev/outbox show it.
import { simpleParser } from "mailparser";
import pg from "pg";
import { SMTPServer } from "smtp-server";

export async function startMailFake(opts: { port: number; databaseUrl: string }) {
  const pool = new pg.Pool({ connectionString: opts.databaseUrl, max: 2 });
  // An idle connection dropped by the server (database dropped at the end of a test run,
  // server restarted) must not take the whole process down; the next query reconnects.
  pool.on("error", () => {});
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then(async (mail) => {
          const to = (Array.isArray(mail.to) ? mail.to : mail.to ? [mail.to] : [])
            .flatMap((a) => a.value.map((v) => v.address ?? "")).filter(Boolean).join(", ");
          await pool.query(
            "insert into mail_outbox (\"to\", \"from\", subject, text, html) values ($1, $2, $3, $4, $5)",
            [to, mail.from?.text ?? null, mail.subject ?? "(no subject)", mail.text ?? null, typeof mail.html === "string" ? mail.html : null],
          );
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, "127.0.0.1", () => resolve());
  });
  return {
    url: `smtp://127.0.0.1:${opts.port}`,
    stop: async () => {
      await new Promise<void>((r) => server.close(() => r()));
      await pool.end();
    },
  };
}
