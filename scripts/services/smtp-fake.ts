import fs from "node:fs";
import path from "node:path";
import crypto from "node:crypto";
import { SMTPServer } from "smtp-server";
import { simpleParser, type AddressObject } from "mailparser";

export interface SmtpFake {
  close(): Promise<void>;
}

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((a) => a.value.map((v) => v.address ?? "")).filter(Boolean);
}

/**
 * A local SMTP server on loopback that accepts every message and keeps it as one JSON file in
 * `directory`, where the development mailbox page reads it. Like a real relay it refuses a recipient under the
 * reserved top-level domain `.invalid` (RFC 2606: no such address can exist), so a refused mail can be tried.
 */
export async function startSmtpFake(port: number, directory: string): Promise<SmtpFake> {
  fs.mkdirSync(directory, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    onRcptTo(address, _session, callback) {
      if (!address.address.toLowerCase().endsWith(".invalid")) return callback();
      callback(Object.assign(new Error(`No mailbox here for ${address.address}`), { responseCode: 550 }));
    },
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) => {
          const id = `${Date.now()}-${crypto.randomBytes(4).toString("hex")}`;
          const message = {
            id,
            receivedAt: new Date().toISOString(),
            from: addresses(mail.from)[0] ?? "",
            to: addresses(mail.to),
            subject: mail.subject ?? "",
            text: mail.text ?? "",
            html: typeof mail.html === "string" ? mail.html : "",
          };
          fs.writeFileSync(path.join(directory, `${id}.json`), JSON.stringify(message, null, 2));
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => resolve());
  });
  return { close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}
