import { useMemo } from 'react';
import { useTranslation } from 'react-i18next';

// How a moment reads on a screen: in the screen's language, and in one time zone. Office screens
// read times in the organisation's zone (a report list, a defect, a repair), so a supervisor away
// from the yard sees the yard's times; the driver's own screens read the phone's zone.
export interface DateFormats {
  // "Dec 3, 2026, 7:05 AM"; '' for a time not yet there.
  dateTime: (iso: string | null | undefined) => string;
  // "Dec 3, 2026"
  date: (iso: string | null | undefined) => string;
  // "7:05 AM"
  time: (iso: string | null | undefined) => string;
  // A calendar day sent as its midnight UTC ("2026-12-15", a deferral's last day): the same day everywhere.
  calendarDate: (iso: string | null | undefined) => string;
}

function formatter(format: Intl.DateTimeFormat): (iso: string | null | undefined) => string {
  return (iso) => (iso ? format.format(new Date(iso)) : '');
}

// `timeZone` undefined: the phone's own zone.
export function dateFormats(locale: string, timeZone?: string): DateFormats {
  return {
    dateTime: formatter(new Intl.DateTimeFormat(locale, { timeZone, dateStyle: 'medium', timeStyle: 'short' })),
    date: formatter(new Intl.DateTimeFormat(locale, { timeZone, dateStyle: 'medium' })),
    time: formatter(new Intl.DateTimeFormat(locale, { timeZone, timeStyle: 'short' })),
    calendarDate: formatter(new Intl.DateTimeFormat(locale, { timeZone: 'UTC', dateStyle: 'medium' })),
  };
}

// Times on the driver's own screens, in the phone's zone.
export function usePhoneDates(): DateFormats {
  const { i18n } = useTranslation();
  return useMemo(() => dateFormats(i18n.language), [i18n.language]);
}
