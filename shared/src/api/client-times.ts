// How far the server trusts the times a phone sends (startedAt, answeredAt and the like).

// A phone's clock may run a little ahead of the server's; beyond this a time is refused as in the
// future. Phones set their clocks from the network; five minutes is a choice of ours, not a rule.
export const CLIENT_CLOCK_SKEW_MS = 5 * 60 * 1000;

// A walk-around started offline may reach the server days later, when the phone finds a signal again;
// one started longer ago than this is refused. Our choice (docs/decisions.md): two weeks covers a long
// haul out of coverage, while a start years off is a wrong clock or a forged time.
export const OFFLINE_WINDOW_DAYS = 14;
export const OFFLINE_WINDOW_MS = OFFLINE_WINDOW_DAYS * 24 * 60 * 60 * 1000;
