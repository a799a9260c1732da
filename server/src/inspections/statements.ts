import type { CertificationAction, Locale, SignatureInput } from '@yardcall/shared';
import type { AuthUser } from '../auth/auth-user';

// What each signer certifies, in the inspection's language. The driver's statement follows what the
// report must say (49 CFR 396.11(a)(2)); the mechanic's, the certification of 396.11(a)(3); the next
// driver's, the review of 396.13(b)-(c). Electronic signatures: 49 CFR 390.32.

interface StatementInput {
  name: string;
  units: string[];
  date: Date;
}

function day(date: Date, locale: Locale): string {
  return new Intl.DateTimeFormat(locale === 'es' ? 'es' : 'en-US', { dateStyle: 'long', timeZone: 'UTC' }).format(date);
}

function list(units: string[], locale: Locale): string {
  return new Intl.ListFormat(locale === 'es' ? 'es' : 'en-US', { type: 'conjunction' }).format(units);
}

export function driverStatement(locale: Locale, input: StatementInput & { defectCount: number }): string {
  const units = list(input.units, locale);
  if (locale === 'es') {
    return input.defectCount === 0
      ? `Yo, ${input.name}, inspeccioné ${units} el ${day(input.date, locale)} y certifico que no encontré ni me informaron de ningún defecto que afecte la operación segura o pueda causar una avería.`
      : `Yo, ${input.name}, inspeccioné ${units} el ${day(input.date, locale)} y certifico que este informe incluye cada defecto que encontré o del que me informaron y que afecta la operación segura o puede causar una avería (${input.defectCount}).`;
  }
  return input.defectCount === 0
    ? `I, ${input.name}, inspected ${units} on ${day(input.date, locale)} and certify that I found, and was told of, no defect that would affect safe operation or cause a breakdown.`
    : `I, ${input.name}, inspected ${units} on ${day(input.date, locale)} and certify that this report lists every defect I found or was told of that would affect safe operation or cause a breakdown (${input.defectCount}).`;
}

export function mechanicStatement(
  locale: Locale,
  input: { name: string; unit: string; defect: string; action: CertificationAction; deferredUntil: Date | null },
): string {
  const what = `"${input.defect}"`;
  if (locale === 'es') {
    switch (input.action) {
      case 'repaired':
        return `Yo, ${input.name}, certifico que el defecto ${what} de la unidad ${input.unit} fue reparado.`;
      case 'no_repair_needed':
        return `Yo, ${input.name}, certifico que el defecto ${what} de la unidad ${input.unit} no necesita reparación para una operación segura.`;
      case 'deferred':
        return `Yo, ${input.name}, certifico que el defecto ${what} de la unidad ${input.unit} no afecta la operación segura y que su reparación se aplaza hasta el ${day(input.deferredUntil ?? new Date(), locale)}.`;
    }
  }
  switch (input.action) {
    case 'repaired':
      return `I, ${input.name}, certify that the defect ${what} on unit ${input.unit} has been repaired.`;
    case 'no_repair_needed':
      return `I, ${input.name}, certify that the defect ${what} on unit ${input.unit} needs no repair for safe operation.`;
    case 'deferred':
      return `I, ${input.name}, certify that the defect ${what} on unit ${input.unit} does not affect safe operation and that its repair is deferred until ${day(input.deferredUntil ?? new Date(), locale)}.`;
  }
}

export function nextDriverStatement(locale: Locale, input: StatementInput): string {
  const units = list(input.units, locale);
  return locale === 'es'
    ? `Yo, ${input.name}, revisé el último informe de inspección de ${units}, del ${day(input.date, locale)}, y las certificaciones de reparación de sus defectos, y lo firmo como constancia de esa revisión.`
    : `I, ${input.name}, reviewed the last inspection report of ${units}, of ${day(input.date, locale)}, and the repair certifications of its defects, and sign it to acknowledge that review.`;
}

// The columns of a signature row that come from who signs and what they sent; the role, the statement
// and the time are the caller's.
export function signerColumns(
  user: AuthUser,
  signature: SignatureInput,
): { signerId: string; name: string; drawing: string | null } {
  return { signerId: user.id, name: signature.name, drawing: signature.drawing ?? null };
}

// Who signs a whole report and when: the driver over the defects it lists, or the next driver.
export type ReportSigning =
  | { role: 'driver'; date: Date; defectCount: number; signedAt: Date }
  | { role: 'next_driver'; date: Date; signedAt: Date };

// The row of a signature on a whole report (no defect of its own), with the statement the signer's role
// certifies over the report's units, in the report's language.
export function reportSignature(
  inspection: { id: string; locale: Locale; vehicles: { unitNumber: string }[] },
  user: AuthUser,
  signature: SignatureInput,
  signing: ReportSigning,
) {
  const input = { name: signature.name, units: inspection.vehicles.map((v) => v.unitNumber), date: signing.date };
  return {
    inspectionId: inspection.id,
    defectId: null,
    role: signing.role,
    ...signerColumns(user, signature),
    statement:
      signing.role === 'driver'
        ? driverStatement(inspection.locale, { ...input, defectCount: signing.defectCount })
        : nextDriverStatement(inspection.locale, input),
    signedAt: signing.signedAt,
  };
}
