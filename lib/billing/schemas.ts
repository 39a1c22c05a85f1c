import { z } from 'zod';

export const MAX_PAID_SEATS = 1000;

// Shared by the seats form and PUT /api/v1/team/billing/seats.
export const seatChangeSchema = z.object({
  paidSeats: z
    .number({ error: 'Enter a whole number of paid seats.' })
    .int('Enter a whole number of paid seats.')
    .min(0, 'Paid seats cannot be negative.')
    .max(MAX_PAID_SEATS, `Ask us about more than ${MAX_PAID_SEATS} seats.`),
});
export type SeatChangeInput = z.input<typeof seatChangeSchema>;
