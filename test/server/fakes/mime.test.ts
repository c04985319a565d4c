/**
 * The outbox's MIME reader against what nodemailer's own composer writes: RFC 2047 encoded words
 * in the subject, RFC 2045 quoted-printable and base64 bodies, RFC 2046 multipart/alternative.
 */
import MailComposer from 'nodemailer/lib/mail-composer';
import { decodeWords, parseMail } from '../../../server/fakes/mime';

function compose(options: ConstructorParameters<typeof MailComposer>[0]): Promise<Buffer> {
  return new MailComposer(options).compile().build();
}

const text = 'Grüße aus der Werkstatt – the spring is 9.5 N/mm.\nA second line that is long enough to need a soft break in quoted-printable, well past seventy-six characters.';
const html = '<p>Grüße aus der Werkstatt – <b>9.5 N/mm</b></p>';

test('reads the subject, the text and the html of a quoted-printable multipart mail', async () => {
  const raw = await compose({ from: 'a@example.test', to: 'b@example.test', subject: 'Federrate für Ihre Gabel ✓', text, html });
  expect(raw.toString('latin1')).toMatch(/quoted-printable/i);
  const mail = parseMail(raw);
  expect(decodeWords(mail.headers.get('subject')!)).toBe('Federrate für Ihre Gabel ✓');
  expect(mail.text?.replace(/\r\n/g, '\n')).toBe(text);
  expect(mail.html).toBe(html);
});

test('reads base64 bodies and skips attachments', async () => {
  const raw = await compose({
    to: 'b@example.test',
    subject: 'plain',
    text,
    textEncoding: 'base64',
    attachments: [{ filename: 'note.txt', content: 'not the body' }],
  });
  const mail = parseMail(raw);
  expect(mail.text?.replace(/\r\n/g, '\n')).toBe(text);
  expect(mail.html).toBeNull();
});
