import {
  DEFAULT_TIME_ZONE,
  type Answer,
  type ChecklistItem,
  type ItemResultResponse,
  formatZonedTime,
  formatMeasure,
  safetyCaution,
  type DefectResponse,
  type DefectStatus,
  type InspectionKind,
  type InspectionResponse,
  type InspectionSummary,
  type NoReadingReason,
  type ReadingRule,
  type SignatureRole,
  type Verdict,
  type VehicleKind,
} from '@yardcall/shared';
import PDFDocument from 'pdfkit';
import { readSignatureDrawing } from './signature-drawing';

// Everything a report shows. Built from an InspectionResponse plus what that contract leaves out
// (organisation, VIN and plate, the drawn signatures), so it renders without HTTP or a database.
export interface ReportVehicle {
  unitNumber: string;
  kind: VehicleKind;
  vin: string;
  plate: string;
}

export interface ReportSignature {
  role: SignatureRole;
  // The name as typed, and the account that signed.
  name: string;
  signerName: string;
  statement: string;
  signedAt: string;
  // An SVG path or a PNG data URL, as it was signed.
  drawing: string | null;
}

export type ReportInspection = Pick<
  InspectionResponse,
  | 'id'
  | 'kind'
  | 'status'
  | 'locale'
  | 'startedAt'
  | 'submittedAt'
  | 'odometer'
  | 'location'
  | 'driver'
  | 'defects'
  | 'results'
  | 'notes'
  | 'requiredReadings'
  | 'checklist'
> & { summary: Pick<InspectionSummary, 'fixedOnTheSpot' | 'checkedWithoutReading' | 'noGauge'> };

export interface InspectionReport {
  organizationName: string;
  inspection: ReportInspection;
  vehicles: ReportVehicle[];
  signatures: ReportSignature[];
  generatedAt: string;
  // The organisation's IANA time zone; every time in the report reads in it (UTC when absent).
  timeZone?: string;
}

const KIND_LABELS: Record<InspectionKind, string> = {
  pre_trip: 'Pre-trip inspection',
  post_trip: 'Post-trip inspection',
  en_route: 'En-route inspection',
  practice: 'Practice walk-around',
};

const VEHICLE_KIND_LABELS: Record<VehicleKind, string> = {
  tractor: 'Tractor',
  trailer: 'Trailer',
  straight_truck: 'Straight truck',
  bus: 'Bus',
};

const STATUS_LABELS: Record<DefectStatus, string> = {
  open: 'Open',
  repaired: 'Repaired',
  no_repair_needed: 'No repair needed',
  deferred: 'Deferred',
};

const READING_RULE_LABELS: Record<ReadingRule, string> = {
  steer_tread_depth: 'steer tire tread depth',
  tread_depth: 'tread depth of every tire',
  tire_pressure: 'every tire pressure, with a gauge',
  pushrod_stroke: 'brake push rod stroke',
  lining_thickness: 'brake lining thickness',
  steering_lash: 'steering wheel free play',
  air_brake_test: 'air brake test readings',
};

const NO_READING_LABELS: Record<NoReadingReason, string> = {
  visual: 'checked without a reading',
  no_gauge: 'no gauge (reading required)',
};

const VERDICT_LABELS: Record<Verdict, string> = {
  ok: 'within limit',
  near_limit: 'near its limit',
  out_of_limit: 'out of limit',
};

const ROLE_LABELS: Record<SignatureRole, string> = {
  driver: 'Driver',
  mechanic: 'Mechanic',
  next_driver: 'Next driver',
};

const REGULAR = 'Atkinson Hyperlegible';
const BOLD = 'Atkinson Hyperlegible Bold';
// The full TTFs (OFL): pdfkit embeds TTF and WOFF, not WOFF2.
const REGULAR_TTF =
  require.resolve('@expo-google-fonts/atkinson-hyperlegible/400Regular/AtkinsonHyperlegible_400Regular.ttf');
const BOLD_TTF = require.resolve('@expo-google-fonts/atkinson-hyperlegible/700Bold/AtkinsonHyperlegible_700Bold.ttf');

const MARGIN = 54;
// The items checked: two columns of small type, so a tractor and trailer's 281 items fit about a page.
const ITEM_COLUMNS = 2;
const ITEM_GUTTER = 14;
const ITEM_FONT_SIZE = 7;
const ITEM_LINE_GAP = 0.6;
const SIGNATURE_BOX = { width: 220, height: 70 };

export function formatReportTime(iso: string | null, timeZone = DEFAULT_TIME_ZONE): string {
  if (!iso) return '—';
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : formatZonedTime(date, timeZone);
}

// "06:05": the time of day in the zone, for the stops (the header says the day and the zone's name).
export function formatReportTimeOfDay(iso: string, timeZone = DEFAULT_TIME_ZONE): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(
    date,
  );
}

class ReportWriter {
  readonly doc: PDFKit.PDFDocument;

  constructor(report: InspectionReport) {
    this.doc = new PDFDocument({
      size: 'LETTER',
      margin: MARGIN,
      bufferPages: true,
      info: {
        Title: `${KIND_LABELS[report.inspection.kind]} ${report.vehicles.map((v) => v.unitNumber).join(' + ')}`,
        Author: report.organizationName,
        Creator: 'Yardcall',
      },
    });
    this.doc.registerFont(REGULAR, REGULAR_TTF);
    this.doc.registerFont(BOLD, BOLD_TTF);
    this.doc.font(REGULAR).fontSize(11);
  }

  private get width(): number {
    return this.doc.page.width - MARGIN * 2;
  }

  // Starts a new page when the next block would not fit.
  ensureRoom(height: number): void {
    if (this.doc.y + height > this.doc.page.height - MARGIN) this.doc.addPage();
  }

  heading(text: string): void {
    this.ensureRoom(60);
    this.doc.moveDown(0.8).font(BOLD).fontSize(14).text(text, MARGIN, this.doc.y, { width: this.width });
    this.doc.moveDown(0.3).font(REGULAR).fontSize(11);
  }

  field(label: string, value: string): void {
    this.ensureRoom(18);
    this.doc.font(BOLD).text(`${label}: `, MARGIN, this.doc.y, { continued: true, width: this.width });
    this.doc.font(REGULAR).text(value);
  }

  paragraph(text: string, options: { bold?: boolean; size?: number; indent?: number } = {}): void {
    this.ensureRoom(18);
    this.doc
      .font(options.bold ? BOLD : REGULAR)
      .fontSize(options.size ?? 11)
      .text(text, MARGIN + (options.indent ?? 0), this.doc.y, { width: this.width - (options.indent ?? 0) });
    this.doc.font(REGULAR).fontSize(11);
  }

  drawing(drawing: string | null): void {
    const parsed = readSignatureDrawing(drawing);
    if (!parsed) {
      if (drawing) this.paragraph('(The drawn signature could not be shown; the typed name stands.)', { indent: 12 });
      return;
    }
    this.ensureRoom(SIGNATURE_BOX.height + 12);
    const x = MARGIN + 12;
    const y = this.doc.y + 4;
    this.doc
      .save()
      .lineWidth(0.5)
      .strokeColor('#888888')
      .rect(x, y, SIGNATURE_BOX.width, SIGNATURE_BOX.height)
      .stroke();
    this.doc.restore();
    if (parsed.kind === 'png') {
      try {
        this.doc.image(parsed.bytes, x + 4, y + 4, {
          fit: [SIGNATURE_BOX.width - 8, SIGNATURE_BOX.height - 8],
          align: 'center',
          valign: 'center',
        });
      } catch {
        this.doc.text('(The drawn signature could not be shown; the typed name stands.)', x + 8, y + 8);
      }
    } else {
      const { box } = parsed;
      const scale = Math.min(
        (SIGNATURE_BOX.width - 8) / Math.max(box.width, 1),
        (SIGNATURE_BOX.height - 8) / Math.max(box.height, 1),
      );
      this.doc
        .save()
        .translate(x + 4, y + 4)
        .scale(scale)
        .translate(-box.minX, -box.minY)
        .path(parsed.path)
        .lineWidth(1.2 / scale)
        .strokeColor('#000000')
        .stroke()
        .restore();
    }
    this.doc.x = MARGIN;
    this.doc.y = y + SIGNATURE_BOX.height + 8;
  }

  // Blocks of small text flowed down columns, then onto a new page; a block never splits. Where the rest
  // fits in the columns of one page, they are balanced so the report goes on below both.
  columns(blocks: readonly ColumnBlock[]): void {
    const doc = this.doc;
    const columnWidth = (this.width - ITEM_GUTTER * (ITEM_COLUMNS - 1)) / ITEM_COLUMNS;
    const options = { width: columnWidth, lineGap: ITEM_LINE_GAP };
    const heights = blocks.map((block) => {
      doc.font(BOLD).fontSize(block.heading ? ITEM_FONT_SIZE + 1 : ITEM_FONT_SIZE);
      return doc.heightOfString(`${block.lead} ${block.text}`, options) + (block.heading ? 3 : 1.5);
    });
    const bottom = doc.page.height - MARGIN;
    let next = 0;
    let top = doc.y;
    while (next < blocks.length) {
      const room = bottom - top;
      const rest = heights.slice(next).reduce((a, b) => a + b, 0);
      // Balanced when the rest fits this page's columns; else each column is filled in turn.
      const target = rest <= room * ITEM_COLUMNS ? Math.min(room, rest / ITEM_COLUMNS) : room;
      let lowest = top;
      for (let column = 0; column < ITEM_COLUMNS && next < blocks.length; column += 1) {
        const x = MARGIN + column * (columnWidth + ITEM_GUTTER);
        let used = 0;
        // The last column takes whatever fits; the others stop at the target height.
        const limit = column === ITEM_COLUMNS - 1 ? room : target;
        while (next < blocks.length && (used === 0 || used + heights[next]! <= limit + 0.5)) {
          if (used + heights[next]! > room) break;
          const block = blocks[next]!;
          const y = top + used + (block.heading ? 2 : 0);
          doc
            .font(BOLD)
            .fontSize(block.heading ? ITEM_FONT_SIZE + 1 : ITEM_FONT_SIZE)
            .text(block.lead, x, y, { ...options, continued: block.text !== '' });
          if (block.text !== '') doc.font(REGULAR).fontSize(ITEM_FONT_SIZE).text(` ${block.text}`, options);
          next += 1;
          // The column goes on from where the block really ended (the estimate is only for fitting).
          used = doc.y - top + (block.heading ? 1 : 1.5);
        }
        lowest = Math.max(lowest, top + used);
      }
      if (next < blocks.length) {
        doc.addPage();
        top = MARGIN;
      } else {
        doc.y = lowest;
      }
    }
    doc.x = MARGIN;
    doc.font(REGULAR).fontSize(11);
  }
}

interface ColumnBlock {
  // Bold: a zone's title, or a stop's place and time.
  lead: string;
  text: string;
  heading?: boolean;
}

function measurementLine(defect: DefectResponse, locale: ReportInspection['locale']): string | null {
  if (!defect.measurement) return null;
  const measured = formatMeasure(defect.measurement.value, defect.measurement.unit, locale);
  if (!defect.limit) return `Measured: ${measured}`;
  const limit = formatMeasure(defect.limit.value, defect.limit.unit, locale);
  return `Measured: ${measured}; limit ${limit} (${defect.limit.source})`;
}

function writeDefect(writer: ReportWriter, defect: DefectResponse, report: InspectionReport, index: number): void {
  const { inspection } = report;
  writer.ensureRoom(80);
  writer.paragraph(
    `${index + 1}. ${defect.title}: ${defect.positionLabel} (unit ${defect.vehicle.unitNumber})${defect.safety ? ', safety item' : ''}`,
    { bold: true },
  );
  writer.paragraph(`Status: ${STATUS_LABELS[defect.status]}`, { indent: 12 });
  if (defect.detail) writer.paragraph(`Driver's words: "${defect.detail}"`, { indent: 12 });
  const result = inspection.results.find((r) => r.itemKey === defect.itemKey);
  if (result?.heard && result.heard !== defect.detail) writer.paragraph(`Heard: "${result.heard}"`, { indent: 12 });
  for (const note of inspection.notes.filter((n) => n.itemKey === defect.itemKey)) {
    const seconds = (note.durationMs / 1000).toFixed(1);
    writer.paragraph(`Voice note (${seconds} s)${note.heard ? `: "${note.heard}"` : ''}`, { indent: 12 });
  }
  const measured = measurementLine(defect, inspection.locale);
  if (measured) writer.paragraph(measured, { indent: 12 });
  if (defect.repair) {
    const repair = defect.repair;
    const until = repair.deferredUntil ? `, until ${formatReportTime(repair.deferredUntil, report.timeZone)}` : '';
    writer.paragraph(
      `Certified ${STATUS_LABELS[repair.action].toLowerCase()}${until} by ${repair.mechanic.name}, ${formatReportTime(repair.signedAt, report.timeZone)}: ${repair.note}`,
      { indent: 12 },
    );
  }
}

// Defects corrected during the walk-around (the shared summary's list): on the record, apart from the
// shop's defects.
function writeSpotFixes(writer: ReportWriter, report: InspectionReport): void {
  const { inspection } = report;
  const fixed = inspection.summary.fixedOnTheSpot;
  if (fixed.length === 0) return;
  const measure = (value: number, unit: string) => formatMeasure(value, unit, inspection.locale);
  writer.heading(`Fixed on the spot (${fixed.length})`);
  writer.paragraph('Corrected by the driver during the inspection: no shop defect was opened for these.');
  fixed.forEach((fix, index) => {
    writer.ensureRoom(60);
    writer.paragraph(`${index + 1}. ${fix.title}: ${fix.positionLabel}${fix.safety ? ', safety item' : ''}`, {
      bold: true,
    });
    if (fix.detail) writer.paragraph(`Found: "${fix.detail}"`, { indent: 12 });
    if (fix.measurement) {
      const verdict = fix.verdict ? `, ${VERDICT_LABELS[fix.verdict]}` : '';
      writer.paragraph(`Reading found: ${measure(fix.measurement.value, fix.measurement.unit)}${verdict}`, {
        indent: 12,
      });
    }
    writer.paragraph(`What was done: ${fix.action}, ${formatReportTime(fix.fixedAt, report.timeZone)}`, { indent: 12 });
    if (fix.newMeasurement) {
      const verdict = fix.newVerdict ? `, ${VERDICT_LABELS[fix.newVerdict]}` : '';
      writer.paragraph(`New reading: ${measure(fix.newMeasurement.value, fix.newMeasurement.unit)}${verdict}`, {
        indent: 12,
      });
    }
    if (fix.heard) writer.paragraph(`Heard: "${fix.heard}"`, { indent: 12 });
  });
}

// Measured checks passed without a value, each said as such; the organisation's rules say which were required.
function writeReadings(writer: ReportWriter, report: InspectionReport): void {
  const { inspection } = report;
  const { checkedWithoutReading, noGauge } = inspection.summary;
  writer.heading('Readings');
  writer.field(
    'Required readings',
    inspection.requiredReadings.length === 0
      ? 'none (a measured check may be passed without a reading)'
      : inspection.requiredReadings.map((rule) => READING_RULE_LABELS[rule]).join('; '),
  );
  const without = [...noGauge, ...checkedWithoutReading];
  if (without.length === 0) {
    writer.paragraph('Every measured check that was passed has its reading.');
    return;
  }
  writer.paragraph(
    `Measured checks passed without a reading (${without.length}): no gauge ${noGauge.length}, checked without a reading ${checkedWithoutReading.length}. Each is marked in the items above.`,
  );
  // A required reading not taken is listed by itself; the checks passed by eye are marked in the items.
  for (const entry of noGauge) {
    writer.paragraph(`${entry.title}: ${entry.positionLabel}: ${NO_READING_LABELS[entry.reason]}`, { indent: 12 });
  }
}

const ANSWER_WORDS: Record<Answer, string> = { pass: 'ok', defect: 'DEFECT', not_applicable: 'not applicable' };

// One item's line: its answer, the reading with its limit and source, the verdict, and what was heard
// for a defect. A stop answered all good lists its items once, after "All good:".
function itemLine(item: ChecklistItem, result: ItemResultResponse | undefined, locale: ReportInspection['locale']) {
  if (!result) return `${item.title}: not answered`;
  const parts: string[] = [];
  if (result.measurement) {
    const measured = formatMeasure(result.measurement.value, result.measurement.unit, locale);
    const limit = result.limit
      ? ` (limit ${formatMeasure(result.limit.value, result.limit.unit, locale)}, ${result.limit.source})`
      : '';
    parts.push(`${measured}${limit}${result.verdict ? `, ${VERDICT_LABELS[result.verdict]}` : ''}`);
  }
  if (result.answer !== 'pass' || !result.measurement) parts.push(ANSWER_WORDS[result.answer]);
  if (result.noReading) parts.push(result.noReading === 'visual' ? 'by eye' : 'no gauge');
  if (result.fixed) parts.push(`fixed on the spot: ${result.fixed.action}`);
  if (result.answer === 'defect') {
    if (result.detail) parts.push(`"${result.detail}"`);
    if (result.heard && result.heard !== result.detail) parts.push(`heard "${result.heard}"`);
  }
  return `${item.title}: ${parts.join(', ')}`;
}

function isPlainPass(result: ItemResultResponse | undefined): boolean {
  return result !== undefined && result.answer === 'pass' && !result.measurement && !result.fixed;
}

// Every item of the checklist, grouped by zone and stop in walk-around order, with the stop's time.
function writeItems(writer: ReportWriter, report: InspectionReport): void {
  const { inspection } = report;
  const { checklist } = inspection;
  const resultOf = new Map(inspection.results.map((r) => [r.itemKey, r]));
  const itemOf = new Map(checklist.items.map((i) => [i.key, i]));
  const zoneTitle = new Map(checklist.zones.map((z) => [z.key, z.title]));
  const answered = inspection.results.length;
  writer.heading(`Items checked (${answered} of ${checklist.items.length})`);
  writer.paragraph(
    'By zone and stop, in walk-around order; the time is when the stop was answered. "by eye": a measured check passed without a reading.',
    { size: 8 },
  );
  const blocks: ColumnBlock[] = [];
  let zone = '';
  for (const stop of checklist.stops) {
    if (stop.zone !== zone) {
      zone = stop.zone;
      blocks.push({ lead: zoneTitle.get(zone) ?? zone, text: '', heading: true });
    }
    const items = stop.itemKeys.flatMap((key) => itemOf.get(key) ?? []);
    const results = items.map((item) => resultOf.get(item.key));
    const times = results.flatMap((r) => (r ? [r.answeredAt] : [])).sort();
    const at = times.length > 0 ? ` ${formatReportTimeOfDay(times[times.length - 1]!, report.timeZone)}` : '';
    const lead = `${stop.label}${at}:`;
    if (results.every(isPlainPass)) {
      const names = items.map((item, n) => (results[n]?.noReading ? `${item.title} (by eye)` : item.title));
      blocks.push({ lead, text: `all ok: ${names.join('; ')}.` });
    } else {
      blocks.push({
        lead,
        text: `${items.map((item, n) => itemLine(item, results[n], inspection.locale)).join('; ')}.`,
      });
    }
  }
  writer.columns(blocks);
}

function writeReport(writer: ReportWriter, report: InspectionReport): void {
  const { inspection } = report;
  const doc = writer.doc;
  doc
    .font(BOLD)
    .fontSize(18)
    .text(`${KIND_LABELS[inspection.kind]} report`, { width: doc.page.width - MARGIN * 2 });
  doc.font(REGULAR).fontSize(12).text(report.organizationName);
  doc.moveDown(0.5).fontSize(11);

  writer.field('Driver', inspection.driver.name);
  writer.field('Started', formatReportTime(inspection.startedAt, report.timeZone));
  writer.field(
    'Submitted',
    inspection.submittedAt ? formatReportTime(inspection.submittedAt, report.timeZone) : 'Not yet submitted',
  );
  writer.field('Odometer', inspection.odometer === null ? '—' : inspection.odometer.toLocaleString('en-US'));
  writer.field('Location', inspection.location ?? '—');
  writer.field('Report id', inspection.id);

  writer.heading('Vehicles');
  for (const vehicle of report.vehicles) {
    writer.paragraph(
      `Unit ${vehicle.unitNumber} (${VEHICLE_KIND_LABELS[vehicle.kind]}) · VIN ${vehicle.vin} · Plate ${vehicle.plate}`,
    );
  }

  writeItems(writer, report);

  writer.heading(`Defects (${inspection.defects.length})`);
  if (inspection.defects.length === 0) {
    writer.paragraph('No defect was found or reported on this inspection.');
  }
  inspection.defects.forEach((defect, index) => writeDefect(writer, defect, report, index));

  writeSpotFixes(writer, report);
  writeReadings(writer, report);

  writer.heading('Safety');
  writer.paragraph(safetyCaution(inspection.locale));

  writer.heading('Signatures');
  if (report.signatures.length === 0) writer.paragraph('Not signed yet.');
  for (const signature of report.signatures) {
    writer.ensureRoom(SIGNATURE_BOX.height + 60);
    const signer =
      signature.signerName && signature.signerName !== signature.name ? ` (account: ${signature.signerName})` : '';
    writer.paragraph(
      `${ROLE_LABELS[signature.role]}: ${signature.name}${signer}, ${formatReportTime(signature.signedAt, report.timeZone)}`,
      {
        bold: true,
      },
    );
    writer.paragraph(signature.statement, { indent: 12 });
    writer.drawing(signature.drawing);
  }

  // Page numbers and the generation time on every page, drawn once all pages exist.
  const range = doc.bufferedPageRange();
  for (let page = range.start; page < range.start + range.count; page += 1) {
    doc.switchToPage(page);
    // The footer sits in the bottom margin; without this pdfkit would start a new page for it.
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    doc
      .font(REGULAR)
      .fontSize(8)
      .text(
        `Yardcall · generated ${formatReportTime(report.generatedAt, report.timeZone)} · page ${page + 1} of ${range.count}`,
        MARGIN,
        doc.page.height - MARGIN + 16,
        { width: doc.page.width - MARGIN * 2, align: 'center', lineBreak: false },
      );
    doc.page.margins.bottom = bottom;
  }
}

// Renders the report as PDF bytes.
export function renderInspectionReport(report: InspectionReport): Promise<Buffer> {
  const writer = new ReportWriter(report);
  const chunks: Buffer[] = [];
  return new Promise((resolve, reject) => {
    writer.doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    writer.doc.on('end', () => resolve(Buffer.concat(chunks)));
    writer.doc.on('error', reject);
    try {
      writeReport(writer, report);
      writer.doc.end();
    } catch (error) {
      reject(error instanceof Error ? error : new Error(String(error)));
    }
  });
}
