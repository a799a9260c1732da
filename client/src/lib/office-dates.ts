import { useMemo } from 'react';
import { useTranslation } from 'react-i18next';
import { useTimeZone } from '@/lib/api/organizations';
import { dateFormats, type DateFormats } from './format-date';

// Times on the office's screens, in the organisation's zone (the phone's own until the zone is known).
export function useOfficeDates(): DateFormats {
  const { i18n } = useTranslation();
  const timeZone = useTimeZone().data?.timeZone;
  return useMemo(() => dateFormats(i18n.language, timeZone), [i18n.language, timeZone]);
}
