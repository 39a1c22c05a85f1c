// Everything the Seats and billing screen and GET /api/v1/team/billing show.
import { seatUsage, type SeatUsage } from '@/lib/team/seats';
import { billingConfig, formatMoney } from './config';
import { teamStanding, type TeamStanding } from './standing';

export interface BillingOverview extends TeamStanding {
  usage: SeatUsage;
  seatPrice: string;
  seatPriceMinor: number;
  currency: string;
  interval: string;
  totalPerInterval: string;
}

export async function billingOverview(teamId: string): Promise<BillingOverview> {
  const [standing, usage] = await Promise.all([teamStanding(teamId), seatUsage(teamId)]);
  const config = billingConfig();
  return {
    ...standing,
    usage,
    seatPrice: formatMoney(config.seatPriceMinor, config.currency),
    seatPriceMinor: config.seatPriceMinor,
    currency: config.currency,
    interval: config.interval,
    totalPerInterval: formatMoney(config.seatPriceMinor * standing.paidSeats, config.currency),
  };
}
