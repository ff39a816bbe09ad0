import { NextResponse } from "next/server";
import { route } from "@/server/api";
import { csvResponse } from "@/server/csv-response";
import { exportBookingsCsv, listBookings, requestBooking } from "@/server/services/lending";
import { bookingListQuerySchema, bookingRequestSchema } from "@/validations/lending";

export const GET = route({ query: bookingListQuerySchema }, async ({ actor, query }) =>
  query.format === "csv" ? csvResponse(await exportBookingsCsv(actor, query), "loans") : listBookings(actor, query),
);

export const POST = route({ body: bookingRequestSchema }, async ({ actor, body }) => {
  const { booking, outcome } = await requestBooking(actor, body);
  return NextResponse.json({ booking, outcome }, { status: 201 });
});
