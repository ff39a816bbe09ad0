// The lending desk: bookings, waitlist offers, due dates, overdue items and receipts. All are the
// member's choice (the "lending" category): the desk and the home page show the same facts.
import { at, defineTemplate } from "./define";

export interface BookingData {
  itemName: string;
  from: string;
  until: string;
  /** /lending */
  path: string;
}

export const bookingApproved = defineTemplate<BookingData & { pickup: string | null }>({
  category: "lending",
  alwaysSent: null,
  body: (data, context) => ({
    subject: `Booked: ${data.itemName}`,
    heading: `Your booking of ${data.itemName} is approved`,
    blocks: [
      {
        kind: "facts",
        rows: [
          ["Item", data.itemName],
          ["From", at(data.from, context)],
          ["Back by", at(data.until, context)],
          ...(data.pickup ? [["Pick up", data.pickup] as const] : []),
        ],
      },
      { kind: "paragraph", text: "Check the item with the gear steward when you collect it, and bring it back clean and dry." },
      { kind: "action", label: "See your bookings", path: data.path },
    ],
  }),
});

export const bookingDeclined = defineTemplate<BookingData & { reason: string | null }>({
  category: "lending",
  alwaysSent: null,
  body: (data, context) => ({
    subject: `Not booked: ${data.itemName}`,
    heading: `Your booking of ${data.itemName} was declined`,
    blocks: [
      { kind: "facts", rows: [["Item", data.itemName], ["Asked for", `${at(data.from, context)} to ${at(data.until, context)}`]] },
      ...(data.reason ? [{ kind: "paragraph", text: `The steward's note: ${data.reason}` } as const] : []),
      { kind: "paragraph", text: "The lending desk shows when the item is free again, and similar items you could borrow instead." },
      { kind: "action", label: "Open the lending desk", path: data.path },
    ],
  }),
});

export const waitlistOffer = defineTemplate<BookingData & { expiresAt: string }>({
  category: "lending",
  alwaysSent: null,
  body: (data, context) => ({
    subject: `Free for you: ${data.itemName}`,
    heading: `${data.itemName} came free for the time you waited for`,
    blocks: [
      {
        kind: "paragraph",
        text: `The item is held for you until ${at(data.expiresAt, context)}. Accept the offer on the lending desk before then, or it goes to the next in line.`,
      },
      { kind: "facts", rows: [["Item", data.itemName], ["From", at(data.from, context)], ["Back by", at(data.until, context)]] },
      { kind: "action", label: "Accept or pass it on", path: data.path },
    ],
  }),
});

export interface DueItem {
  name: string;
  dueAt: string;
}

export const itemDueTomorrow = defineTemplate<{ items: DueItem[]; path: string }>({
  category: "lending",
  alwaysSent: null,
  body: (data, context) => ({
    subject: data.items.length === 1 ? `Due back tomorrow: ${data.items[0].name}` : `${data.items.length} items due back tomorrow`,
    heading: "Due back tomorrow",
    blocks: [
      { kind: "list", items: data.items.map((item) => `${item.name}, by ${at(item.dueAt, context)}`) },
      { kind: "paragraph", text: "Need it longer? Ask for more time on the lending desk before it is due, so others can plan." },
      { kind: "action", label: "See your loans", path: data.path },
    ],
  }),
});

export const itemOverdue = defineTemplate<{ itemName: string; dueAt: string; daysOverdue: number; path: string }>({
  category: "lending",
  alwaysSent: null,
  body: (data, context) => ({
    subject: `Overdue: ${data.itemName}`,
    heading: `${data.itemName} is overdue`,
    blocks: [
      {
        kind: "paragraph",
        text: `It was due back ${at(data.dueAt, context)}, ${data.daysOverdue} ${data.daysOverdue === 1 ? "day" : "days"} ago. Others may be waiting for it. Guyline reminds you every day until it is back.`,
      },
      { kind: "paragraph", text: "Bring it to the gear steward, or say on the lending desk when you can." },
      { kind: "action", label: "See your loans", path: data.path },
    ],
  }),
});

export const returnReceipt = defineTemplate<{ itemName: string; returnedAt: string; receivedBy: string; condition: string; notes: string | null; path: string }>({
  category: "lending",
  alwaysSent: null,
  body: (data, context) => ({
    subject: `Returned: ${data.itemName}`,
    heading: `Thank you: ${data.itemName} is back`,
    blocks: [
      {
        kind: "facts",
        rows: [
          ["Item", data.itemName],
          ["Returned", at(data.returnedAt, context)],
          ["Received by", data.receivedBy],
          ["Condition", data.condition],
          ...(data.notes ? [["Notes", data.notes] as const] : []),
        ],
      },
      { kind: "paragraph", text: "Keep this message as your receipt." },
      { kind: "action", label: "See your loans", path: data.path },
    ],
  }),
});
