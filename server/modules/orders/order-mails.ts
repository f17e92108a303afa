// The wording of the orders' e-mails: plain text first, and a simple HTML twin with the same
// words. Never a field name or a path: what the person sees is what the page says.
import { mailHtml } from '../mail/mail-html.ts';

const until = (d: Date) => d.toUTCString().replace(/:\d\d GMT$/, ' UTC');

function mail(subject: string, lines: string[], link: { href: string; label: string }, footer: string) {
  const html = mailHtml(lines, link, footer);
  return { subject, text: `${lines.join('\n\n')}\n\n${link.href}\n\n${footer}\n`, html };
}

/** To the customer: please measure, with the link to the measuring page. */
export function measureRequestMail(p: { shopName: string; customerName: string; wearerName: string; where: string; pieceWords: string; message: string; link: string; expiresAt: Date }) {
  const lines = [
    `Hello ${p.customerName},`,
    `${p.shopName} is making ${p.pieceWords} for ${p.wearerName} and needs the ${p.where} measurement to cut it to fit.`,
    ...(p.message ? [p.message] : []),
    `The page below shows how to measure and takes two readings. The link works once and runs out on ${until(p.expiresAt)}.`,
  ];
  return mail(`${p.shopName}: a measurement for ${p.wearerName}`, lines, { href: p.link, label: 'Measure and send' }, 'If you did not expect this, ignore it: nothing changes until the page is filled in.');
}

/** To the shop: the customer answered. */
export function measureAnsweredMail(p: { orderNumber: number; wearerName: string; customerName: string; girthText: string; note: string; link: string }) {
  const lines = [`${p.customerName} measured ${p.wearerName}: ${p.girthText}.`, `Order ${p.orderNumber} now has its girth and is ready to cut.`, ...(p.note ? [`Their note:\n${p.note}`] : [])];
  return mail(`Order ${p.orderNumber}: ${p.wearerName} measured ${p.girthText}`, lines, { href: p.link, label: `Open order ${p.orderNumber}` }, 'Sent by Latchet when a customer answers a measuring link.');
}

/** To the shop: the customer approved the proof or asked for a change. */
export function proofAnsweredMail(p: { orderNumber: number; wearerName: string; customerName: string; approved: boolean; message: string; link: string }) {
  const lines = p.approved
    ? [`${p.customerName} approved the proof of order ${p.orderNumber} for ${p.wearerName}.`]
    : [`${p.customerName} asked for a change to order ${p.orderNumber} for ${p.wearerName}:`, p.message];
  const subject = p.approved ? `Order ${p.orderNumber}: proof approved` : `Order ${p.orderNumber}: change asked for`;
  return mail(subject, lines, { href: p.link, label: `Open order ${p.orderNumber}` }, 'Sent by Latchet when a customer answers a proof link.');
}
