import { safetyDefectMail, type SafetyDefectFacts } from './safety-defect-mail-text';

const facts: SafetyDefectFacts = {
  driverName: 'Dana Okafor',
  kind: 'pre_trip',
  units: ['KV-101', 'KV-T21'],
  submittedAt: new Date('2026-11-30T06:20:00.000Z'),
  timeZone: 'America/Chicago',
  defects: [
    { unit: 'KV-101', title: 'Air leak', positionLabel: 'Tractor, cab', detail: 'audible at idle' },
    { unit: 'KV-T21', title: 'Brake hose', positionLabel: 'Trailer, axle 1, left', detail: null },
  ],
  link: 'http://yardcall.example.test/inspections/abc',
};

describe('safety-defect e-mail', () => {
  it('names the units, the driver, each defect and the link, with the usual caution', () => {
    const mail = safetyDefectMail('en', 'mechanic@yardcall.test', facts);
    expect(mail.to).toBe('mechanic@yardcall.test');
    expect(mail.subject).toBe('Safety defect on unit KV-101 and KV-T21: out of service until certified');
    expect(mail.text).toContain('Dana Okafor reported 2 safety defects in the pre-trip inspection of KV-101 + KV-T21');
    expect(mail.text).toContain('- KV-101: Air leak, Tractor, cab (audible at idle)');
    expect(mail.text).toContain('- KV-T21: Brake hose, Trailer, axle 1, left\n');
    expect(mail.text).toContain('396.11(a)(3)');
    expect(mail.text).toContain('Open the report: http://yardcall.example.test/inspections/abc');
    expect(mail.text).toContain('does not replace your judgement');
  });

  it("gives the submit time on the organisation's clock, with the zone's name", () => {
    expect(safetyDefectMail('en', 'mechanic@yardcall.test', facts).text).toContain('(submitted 2026-11-30 00:20 CST)');
    const utc = safetyDefectMail('en', 'mechanic@yardcall.test', { ...facts, timeZone: 'UTC' });
    expect(utc.text).toContain('(submitted 2026-11-30 06:20 UTC)');
  });

  it('speaks Spanish to a recipient who reads Spanish', () => {
    const mail = safetyDefectMail('es', 'supervisor@yardcall.test', { ...facts, defects: [facts.defects[0]!] });
    expect(mail.subject).toBe('Defecto de seguridad en la unidad KV-101: fuera de servicio hasta certificar');
    expect(mail.text).toContain('Dana Okafor informó un defecto de seguridad en la inspección antes del viaje');
    expect(mail.text).toContain('no reemplaza su criterio');
  });
});
