import { describe, expect, it } from "vitest";
import { startFakeSmtp, type ReceivedMail } from "../../../server/mail/fake-smtp";
import { createMailer } from "../../../server/mail/mailer";
import { decodeEncodedWords, parseMessage } from "../../../server/mail/parse-message";

describe("fake SMTP with the nodemailer transport", () => {
  it("receives what nodemailer sends, decoded (non-ASCII subject, long lines, text + html)", async () => {
    const got: ReceivedMail[] = [];
    const smtp = await startFakeSmtp({ port: 0, onMessage: (m) => void got.push(m) });
    const mailer = createMailer({ host: "127.0.0.1", port: smtp.port, from: "Équipe Equilibrist <no-reply@eq.test>" });
    try {
      const subject = "Réinitialiser — μ, τ et Σ ".repeat(3).trim();
      const text = `Bonjour μ\n${"long line ".repeat(30)}\nhttp://127.0.0.1:4310/reset?token=ab_c-D=E`;
      await mailer.send({ to: "Ada@Lab.example", subject, text, html: "<p>Salut <b>τ</b></p>" });
      await mailer.send({ to: "plain@lab.example", subject: "plain", text: "only text" });
      expect(got).toHaveLength(2);
      expect(got[0]).toMatchObject({ subject, text, html: "<p>Salut <b>τ</b></p>", from: "Équipe Equilibrist <no-reply@eq.test>" });
      expect(got[0].to.toLowerCase()).toBe("ada@lab.example");
      expect(got[1]).toMatchObject({ subject: "plain", text: "only text", html: null });
    } finally {
      mailer.close();
      await smtp.close();
    }
  });

  it("answers an SMTP error when storing fails, so the sender learns of it", async () => {
    const smtp = await startFakeSmtp({ port: 0, onMessage: () => Promise.reject(new Error("disk full")) });
    const mailer = createMailer({ host: "127.0.0.1", port: smtp.port, from: "x@eq.test" });
    try {
      await expect(mailer.send({ to: "a@lab.example", subject: "s", text: "t" })).rejects.toThrow();
    } finally {
      mailer.close();
      await smtp.close();
    }
  });
});

describe("parseMessage", () => {
  it("reads folded headers, base64 parts and skips attachments", () => {
    // A hand-written multipart message (RFC 2045/2046/2047 constructs; values chosen by hand).
    const raw = [
      "From: =?UTF-8?B?w4lsaXNl?= <e@lab.example>",
      "Subject: =?UTF-8?Q?caf=C3=A9?=",
      "  =?UTF-8?Q?_au_lait?=",
      'Content-Type: multipart/mixed; boundary="outer"',
      "",
      "--outer",
      "Content-Type: text/plain; charset=utf-8",
      "Content-Transfer-Encoding: base64",
      "",
      Buffer.from("ligne un\r\nligne deux é").toString("base64"),
      "--outer",
      "Content-Type: text/plain",
      "Content-Disposition: attachment; filename=a.txt",
      "",
      "not the body",
      "--outer--",
      "",
    ].join("\r\n");
    const parsed = parseMessage(Buffer.from(raw, "utf8"));
    expect(parsed).toEqual({ subject: "café au lait", fromHeader: "Élise <e@lab.example>", text: "ligne un\nligne deux é", html: null });
  });

  it("decodes quoted-printable soft breaks and leaves plain words alone", () => {
    const raw = "Subject: hi\r\nContent-Type: text/html; charset=utf-8\r\nContent-Transfer-Encoding: quoted-printable\r\n\r\n<p>a=3Db =\r\nc=C3=A9</p>\r\n";
    expect(parseMessage(Buffer.from(raw))).toMatchObject({ subject: "hi", text: "", html: "<p>a=b cé</p>" });
    expect(decodeEncodedWords("no words here")).toBe("no words here");
  });
});
