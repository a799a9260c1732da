import { formatZonedTime, type InspectionKind, type Locale } from '@yardcall/shared';
import type { OutgoingMail } from '../mail/mail.service';

export interface SafetyDefectFacts {
  driverName: string | null;
  kind: InspectionKind;
  // Power unit first, then trailers.
  units: string[];
  submittedAt: Date | null;
  // The organisation's IANA time zone: the time reads as the people at the yard see it.
  timeZone: string;
  defects: { unit: string; title: string; positionLabel: string; detail: string | null }[];
  link: string;
}

const KIND: Record<Locale, Record<InspectionKind, string>> = {
  en: { pre_trip: 'pre-trip', post_trip: 'post-trip', en_route: 'en-route', practice: 'practice' },
  es: { pre_trip: 'antes del viaje', post_trip: 'después del viaje', en_route: 'en ruta', practice: 'de práctica' },
};

// The same caution the driver's screens show (client i18n walkaround.caution).
const CAUTION: Record<Locale, string> = {
  en: "Yardcall supports and does not replace your judgement. The limits it checks are minimums; local rules, the manufacturer's specifications and licensed practice govern.",
  es: 'Yardcall le ayuda y no reemplaza su criterio. Los límites que comprueba son mínimos; rigen las normas locales, las especificaciones del fabricante y la práctica de un profesional autorizado.',
};

function list(locale: Locale, items: string[]): string {
  return new Intl.ListFormat(locale === 'es' ? 'es' : 'en-US', { type: 'conjunction' }).format(items);
}

// The subject names the unit(s) with a safety defect; the body the driver, each defect and the link.
export function safetyDefectMail(locale: Locale, to: string, facts: SafetyDefectFacts): OutgoingMail {
  const defectUnits = [...new Set(facts.defects.map((d) => d.unit))];
  const when = facts.submittedAt ? formatZonedTime(facts.submittedAt, facts.timeZone) : '';
  const lines = facts.defects.map(
    (d) => `- ${d.unit}: ${d.title}, ${d.positionLabel}${d.detail ? ` (${d.detail})` : ''}`,
  );
  const count = facts.defects.length;
  if (locale === 'es') {
    return {
      to,
      subject: `Defecto de seguridad en la unidad ${list('es', defectUnits)}: fuera de servicio hasta certificar`,
      text: [
        `${facts.driverName ?? 'Un conductor'} informó ${count === 1 ? 'un defecto de seguridad' : `${count} defectos de seguridad`} en la inspección ${KIND.es[facts.kind]} de ${facts.units.join(' + ')} (enviada ${when}).`,
        '',
        ...lines,
        '',
        'La unidad queda fuera de servicio hasta que cada defecto se repare o se certifique que no necesita reparación (49 CFR 396.11(a)(3)).',
        `Abrir el informe: ${facts.link}`,
        '',
        CAUTION.es,
      ].join('\n'),
    };
  }
  return {
    to,
    subject: `Safety defect on unit ${list('en', defectUnits)}: out of service until certified`,
    text: [
      `${facts.driverName ?? 'A driver'} reported ${count === 1 ? 'a safety defect' : `${count} safety defects`} in the ${KIND.en[facts.kind]} inspection of ${facts.units.join(' + ')} (submitted ${when}).`,
      '',
      ...lines,
      '',
      'The unit stays out of service until each defect is repaired or certified as not needing repair (49 CFR 396.11(a)(3)).',
      `Open the report: ${facts.link}`,
      '',
      CAUTION.en,
    ].join('\n'),
  };
}
