import { createContext, useContext, useMemo, type ReactNode } from 'react';
import {
  DEFAULT_SHIP_TIME_ZONE,
  shipClock,
  shipDateTime,
  shipTime,
  shipTimeRange,
  shipTimeZone,
} from '@catline/contracts';
import { useShips } from './queries/ships-query.js';

// Every time on screen is the ship's clock with its zone named, whatever zone the device is set to.
// A screen about a cycle tells the times in that cycle's ship's zone; any other screen in the zone of the
// ship the person sees (their own). Where no single ship is at hand (a fleet admin sees every ship, or the
// ships are still loading), times are told in UTC, and say so: never in the device's zone, unnamed.

const ZoneContext = createContext<string | null>(null);

/** The zone times below are shown in; left undefined, the zone around it holds. */
export function ShipTimeZone({ zone, children }: { zone: string | undefined; children: ReactNode }) {
  const around = useContext(ZoneContext);
  return <ZoneContext.Provider value={zone ?? around}>{children}</ZoneContext.Provider>;
}

/** The zone of the one ship the person sees, around every screen. */
export function OwnShipTimeZone({ children }: { children: ReactNode }) {
  const ships = useShips();
  const only = ships.data?.length === 1 ? ships.data[0] : undefined;
  return <ShipTimeZone zone={only && shipTimeZone(only.profile)}>{children}</ShipTimeZone>;
}

const useShipTimeZone = (): string => useContext(ZoneContext) ?? DEFAULT_SHIP_TIME_ZONE;

export interface ShipClock {
  /** "14:05:30 GMT+4". */
  clock: (instant: Date | string) => string;
  /** As `clock`, or a dash for none. */
  optionalClock: (instant: Date | string | null) => string;
  /** "14:05 GMT+4". */
  time: (instant: Date | string) => string;
  /** "14:05–14:50 GMT+4": the zone named once. */
  timeRange: (from: Date | string, to: Date | string) => string;
  /** "2026-12-02 14:05 GMT+4". */
  dateTime: (instant: Date | string) => string;
}

export function shipClockIn(timeZone: string): ShipClock {
  return {
    clock: (instant) => shipClock(instant, timeZone),
    optionalClock: (instant) => (instant ? shipClock(instant, timeZone) : '—'),
    time: (instant) => shipTime(instant, timeZone),
    timeRange: (from, to) => shipTimeRange(from, to, timeZone),
    dateTime: (instant) => shipDateTime(instant, timeZone),
  };
}

/** The formatters of the zone around the component. */
export function useShipClock(): ShipClock {
  const timeZone = useShipTimeZone();
  return useMemo(() => shipClockIn(timeZone), [timeZone]);
}
