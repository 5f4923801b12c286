// Receipt and refund e-mails. Amounts are written in the student's locale as it was when they paid (their first
// Accept-Language tag); dates without a viewer, like every e-mail (shared/format/dates.ts). Sent once per payment.
import type { OutgoingEmail } from '../mail/mailer.ts';
import { formatDate, WITHOUT_VIEWER } from '@shared/format/dates.ts';
import { formatMoney } from '@shared/format/money.ts';

interface PaymentFacts {
  id: string;
  classTitle: string;
  amount: number;
  currency: string;
  locale: string | null;
}

export function receiptEmail(to: string, name: string, p: PaymentFacts, paidAt: Date, classLink: string): OutgoingEmail {
  return {
    to,
    kind: 'payment-receipt',
    dedupeKey: `payment-receipt:${p.id}`,
    subject: `Receipt: "${p.classTitle}"`,
    text: [
      `Hello ${name},`,
      '',
      `Thank you. You paid ${formatMoney(p.amount, p.currency, p.locale ?? undefined)} for the class "${p.classTitle}" on ${formatDate(paidAt, 'day', WITHOUT_VIEWER)}.`,
      `Receipt number: ${p.id}`,
      '',
      'Your lessons are waiting for you:',
      '',
      classLink,
      '',
      'The payment was taken by our payments service; Threadway never sees your card.',
      '',
      '— Threadway',
    ].join('\n'),
  };
}

export function refundEmail(to: string, name: string, p: PaymentFacts, refundedAt: Date): OutgoingEmail {
  return {
    to,
    kind: 'payment-refund',
    dedupeKey: `payment-refund:${p.id}`,
    subject: `Refund: "${p.classTitle}"`,
    text: [
      `Hello ${name},`,
      '',
      `Your payment of ${formatMoney(p.amount, p.currency, p.locale ?? undefined)} for "${p.classTitle}" was refunded on ${formatDate(refundedAt, 'day', WITHOUT_VIEWER)}.`,
      'Lessons released before then stay open to you; later lessons will not open.',
      `Receipt number: ${p.id}`,
      '',
      '— Threadway',
    ].join('\n'),
  };
}
