// Where an order stands, and which moves a person may make from there.
import { z } from "zod";
import { plainText } from "@/lib/validation/text";

export const ORDER_STATUSES = ["awaiting-payment", "paid", "parts-reserved", "back-ordered", "fitted", "cancelled", "refunded"] as const;
export type OrderStatus = (typeof ORDER_STATUSES)[number];

export const ORDER_STATUS_LABELS: Record<OrderStatus, string> = {
  "awaiting-payment": "Awaiting payment",
  paid: "Paid",
  "parts-reserved": "Parts reserved",
  "back-ordered": "Back-ordered",
  fitted: "Fitted",
  cancelled: "Cancelled",
  refunded: "Refunded",
};

/** Paid and not yet fitted, cancelled or refunded: the parts are (or will be) held for it. */
const PAID_OPEN: readonly OrderStatus[] = ["paid", "parts-reserved", "back-ordered"];

export const isPaidOpen = (s: OrderStatus) => PAID_OPEN.includes(s);
export const canMarkFitted = (s: OrderStatus) => PAID_OPEN.includes(s);
/** Cancelling an unpaid order just closes it; a paid one is refunded and its parts released. */
export const canCancel = (s: OrderStatus) => s === "awaiting-payment" || PAID_OPEN.includes(s);

/** After payment: reserved when the shelf covered every part, back-ordered when it fell short. */
export const statusAfterReservation = (backOrdered: number): OrderStatus => (backOrdered > 0 ? "back-ordered" : "parts-reserved");

/** Takes what the shelf has, up to what is asked; the rest waits for stock. */
export function allocate(requested: number, onShelf: number): { reserved: number; backOrdered: number } {
  const reserved = Math.max(0, Math.min(requested, onShelf));
  return { reserved, backOrdered: requested - reserved };
}


export const orderListQuerySchema = z.object({
  status: z.enum([...ORDER_STATUSES, ""], { error: `status must be one of ${ORDER_STATUSES.join(", ")}.` }).optional(),
  search: plainText("Search", 100).optional(),
  page: z.coerce.number().int().min(1, "page must be 1 or more").default(1),
  pageSize: z.coerce.number().int().min(1).max(100, "pageSize must be at most 100").default(20),
});

export const cancelOrderSchema = z.object({ reason: plainText("Reason", 500).default("") });
export const markFittedSchema = z.object({
  datalogId: z.union([z.uuid({ error: "datalogId must be the id of a datalog." }), z.literal(""), z.null()]).optional().transform((v) => v || null),
});
export const declineSheetSchema = z.object({ reason: plainText("Reason", 1000, { multiline: true }).default("") });

export type OrderListQuery = z.input<typeof orderListQuerySchema>;
