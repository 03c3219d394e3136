/**
 * The production sheet as a PDF (pdfkit): the summary the embroiderer works from, then the 1:1 templates.
 */
import type { PaperSize, ProductionSheet, SheetPlacement } from '../../contracts/production-sheet.ts';
import { addTemplatePages } from './production-sheet-pdf-templates.ts';
import { hoopingWhere, minutesText } from './production-sheet-wording.ts';
import { placementDetailLines } from './production-sheet-placement-lines.ts';
import {
  ACCENT,
  createSheetDocument,
  finishDocument,
  FONT,
  FONT_BOLD,
  formatLengthPlain,
  INK,
  MARGIN_MM,
  PAPER_TINT,
  pt,
  SOFT_INK,
  type Pdf,
} from './production-sheet-pdf-kit.ts';

const HOOPING_FILLS = ['#e9c3b8', '#c9d8c4', '#f3e0a6', '#d3dbe8'];

/** Renders the sheet: summary page(s) first, then every template tile. */
export async function renderProductionSheetPdf(sheet: ProductionSheet, paper: PaperSize): Promise<Buffer> {
  const doc = createSheetDocument(paper, `Production sheet ${sheet.order.number}`);
  new SummaryWriter(doc, sheet).write();
  addTemplatePages(doc, paper, sheet.order.number, sheet.templates);
  return finishDocument(doc);
}

/** Writes the summary top to bottom, starting a new page whenever the next block would not fit. */
class SummaryWriter {
  private y = 0;
  private readonly left = pt(MARGIN_MM);
  private readonly width: number;

  constructor(
    private readonly doc: Pdf,
    private readonly sheet: ProductionSheet,
  ) {
    this.doc.addPage();
    this.width = this.doc.page.width - 2 * this.left;
    this.y = this.left;
  }

  write(): void {
    const { order } = this.sheet;
    this.text(`Production sheet · ${order.number}`, { size: 16, bold: true });
    this.text(
      `${order.designName} for ${order.customerName}${order.neededBy ? ` · needed by ${order.neededBy}` : ''}`,
      { size: 10, colour: SOFT_INK },
    );
    if (order.customerNote) this.text(`Customer's note: "${order.customerNote}"`, { size: 9, colour: SOFT_INK });
    this.approvalNotes();
    this.gap(4);
    this.garmentLine();
    for (const placement of this.sheet.placements) if (placement.border) this.hoopingPlan(placement, placement.border);
    this.heading('Stitching order');
    this.text(this.sheet.sewingOrder.rule, { size: 9 });
    for (const step of this.sheet.sewingOrder.steps) this.text(`${step.order}.  ${step.text}`, { size: 9, indent: 8 });
    this.heading('Placements and threads');
    for (const placement of this.sheet.placements) this.placement(placement);
    this.materials();
    this.heading('Safety cautions (guidance only; follow your local regulations)');
    for (const caution of this.sheet.cautions) this.text(`${caution.title}: ${caution.text}`, { size: 8.5 });
    this.gap(6);
    const pages = this.sheet.templates.length;
    this.text(
      pages > 0
        ? 'The 1:1 templates follow. Print at 100 % (actual size) and check the 50 mm square on each page with a ruler before cutting.'
        : 'This design has no template to print.',
      { size: 9, bold: true },
    );
  }

  private garmentLine(): void {
    const { garment, order } = this.sheet;
    this.ensure(24);
    this.doc.rect(this.left, this.y, 18, 18).fillAndStroke(garment.colourHex, INK);
    this.doc
      .fillColor(INK)
      .font(FONT_BOLD)
      .fontSize(11)
      .text(`${garment.name} · size ${garment.sizeLabel} · ${garment.colourName}`, this.left + 26, this.y + 1, {
        width: this.width - 26,
      });
    this.doc
      .font(FONT)
      .fontSize(9)
      .fillColor(SOFT_INK)
      .text(`${garment.fabricType} fabric · ${order.quantity} to make`, this.left + 26, this.y + 14, {
        width: this.width - 26,
      });
    this.y += 32;
  }

  private hoopingPlan(placement: SheetPlacement, border: NonNullable<SheetPlacement['border']>): void {
    this.heading(`Hooping plan · ${placement.label}`);
    const loop = border.isClosed
      ? `round the ${formatLengthPlain(border.runLengthMm, 0)} hem loop`
      : `along the ${formatLengthPlain(border.runLengthMm, 0)} front hem`;
    this.text(
      `${border.count} repeats of ${formatLengthPlain(border.repeatWidthMm)} at ${border.scalePct} % ${loop}: ${border.hoopings.length} hoopings in the ` +
        `${placement.hoop?.name ?? 'hoop'}${border.isRotated ? ' (design turned 90° in the hoop)' : ''}. Mark the centre front and the guide line ` +
        `${formatLengthPlain(border.hemOffsetMm)} above the hem edge.`,
      { size: 9 },
    );
    this.text(`${border.orderRule} ${border.clearanceNote}`, { size: 9 });
    this.gap(4);
    this.hemPicture(border);
    for (const hooping of border.hoopings) {
      const repeats =
        hooping.repeatNumbers.length === 1
          ? `repeat ${hooping.repeatNumbers[0]}`
          : `repeats ${hooping.repeatNumbers.join(', ')}`;
      this.text(
        `${hooping.order}.  ${repeats}: hoop centre ${hoopingWhere(hooping.fromCentreMm, formatLengthPlain(Math.abs(hooping.fromCentreMm)))}`,
        { size: 9 },
      );
    }
    this.gap(6);
  }

  /** The hem laid flat, the centre mark in the middle, each hooping as a numbered rectangle over its repeats. */
  private hemPicture(border: NonNullable<SheetPlacement['border']>): void {
    const height = 64;
    this.ensure(height + 24);
    const doc = this.doc;
    const top = this.y + 12;
    const scale = this.width / border.runLengthMm;
    const x = (mm: number) => this.left + mm * scale;
    const groupMm = (n: number) => (n - 1) * border.pitchMm + border.repeatWidthMm;
    doc.rect(this.left, top, this.width, height).fill(PAPER_TINT);
    doc
      .lineWidth(1.5)
      .moveTo(this.left, top + height)
      .lineTo(this.left + this.width, top + height)
      .stroke(INK);
    doc
      .fillColor(SOFT_INK)
      .font(FONT)
      .fontSize(7)
      .text('hem edge', this.left, top + height + 2, { lineBreak: false });
    if (border.isClosed) {
      doc.text('back: the loop ends meet', this.left, this.y, { lineBreak: false });
      doc.text('back', this.left + this.width - 20, this.y, { lineBreak: false });
    }
    for (const hooping of border.hoopings) {
      const widthMm = groupMm(hooping.repeatNumbers.length);
      const left = x(hooping.fromRowStartMm - widthMm / 2);
      doc
        .rect(left + 1, top + 10, widthMm * scale - 2, height - 24)
        .fillAndStroke(HOOPING_FILLS[(hooping.order - 1) % HOOPING_FILLS.length], INK);
      const cx = x(hooping.fromRowStartMm);
      doc.circle(cx, top + height / 2 - 2, 9).fillAndStroke('#ffffff', INK);
      doc
        .fillColor(INK)
        .font(FONT_BOLD)
        .fontSize(10)
        .text(String(hooping.order), cx - 9, top + height / 2 - 8, { width: 18, align: 'center', lineBreak: false });
      doc
        .font(FONT)
        .fontSize(7)
        .fillColor(SOFT_INK)
        .text(
          `${hooping.fromCentreMm > 0 ? '+' : ''}${Number(hooping.fromCentreMm.toFixed(1))}`,
          cx - 20,
          top + height - 12,
          { width: 40, align: 'center', lineBreak: false },
        );
    }
    const centre = x(border.runLengthMm / 2);
    doc
      .lineWidth(1)
      .dash(3, { space: 2 })
      .moveTo(centre, top - 4)
      .lineTo(centre, top + height)
      .stroke(ACCENT)
      .undash();
    doc
      .fillColor(ACCENT)
      .fontSize(7)
      .text('centre mark (centre front)', centre - 50, this.y, { width: 100, align: 'center', lineBreak: false });
    this.y = top + height + 14;
    this.text('Numbers in circles are the stitching order; figures under them are mm from the centre mark.', {
      size: 7.5,
      colour: SOFT_INK,
    });
    this.gap(3);
  }

  private placement(placement: SheetPlacement): void {
    const size = `${formatLengthPlain(placement.widthMm)} × ${formatLengthPlain(placement.heightMm)}`;
    this.text(placement.label, { size: 10, bold: true });
    this.text(
      `${size} · ${placement.stitches.toLocaleString('en-US')} stitches · ${placement.colourChanges} colour changes · ${placement.hoopings} hooping${placement.hoopings === 1 ? '' : 's'}` +
        `${placement.hoop ? ` · ${placement.hoop.name}` : ''}`,
      { size: 8.5, colour: SOFT_INK },
    );
    for (const line of placementDetailLines(placement))
      this.text(line.text, { size: 8.5, bold: line.isWarning, colour: line.isWarning ? ACCENT : INK });
    for (const thread of placement.threads) {
      this.ensure(16);
      this.doc.rect(this.left + 8, this.y + 1, 22, 11).fillAndStroke(thread.hex, INK);
      this.doc
        .fillColor(INK)
        .font(FONT)
        .fontSize(8.5)
        .text(`${thread.order}.  ${thread.code}  ${thread.name}  (${thread.hex})`, this.left + 36, this.y + 1.5, {
          width: this.width - 36,
        });
      this.y += 15;
    }
    this.gap(5);
  }

  private materials(): void {
    const { stabilizer, needle, runMinutes, totals, order } = this.sheet;
    this.heading('Stabilizer, needle and machine time');
    this.text(
      `Backing: ${stabilizer.backingName} (design ${stabilizer.density}, ${stabilizer.densityStitchesPerCm2.toFixed(0)} stitches per cm²).`,
      { size: 9 },
    );
    this.text(`Topping: ${stabilizer.toppingName}.`, { size: 9 });
    for (const message of stabilizer.messages)
      this.text(`${message.title}: ${message.text}`, { size: 8.5, colour: SOFT_INK });
    this.text(`Needle: ${needle.size} ${needle.point} (rule of thumb). ${needle.note}`, { size: 9 });
    this.text(
      `Per garment: ${totals.stitches.toLocaleString('en-US')} stitches, ${totals.colourChanges} colour changes, ${totals.hoopings} hoopings: about ${minutesText(runMinutes.totalMinutes)} with setup.` +
        (order.quantity > 1 ? ` All ${order.quantity}: about ${minutesText(runMinutes.orderMinutes)}.` : ''),
      { size: 9 },
    );
    for (const item of runMinutes.items)
      this.text(`${item.label}: ${minutesText(item.minutes)}`, { size: 8.5, colour: SOFT_INK, indent: 8 });
    this.gap(6);
  }

  /** What the customer asked for when approving: the operator reads it before the first stitch. */
  private approvalNotes(): void {
    const notes = this.sheet.order.approvalNotes;
    if (!notes) return;
    this.heading(`Customer notes on the approved proof ${notes.proofVersion}`);
    if (notes.comment) this.text(`"${notes.comment}"`, { size: 9 });
    for (const [index, pin] of notes.pins.entries()) this.text(`Pin ${index + 1}: "${pin}"`, { size: 9 });
  }

  private heading(title: string): void {
    this.ensure(40);
    this.gap(4);
    this.text(title, { size: 12, bold: true });
    this.doc
      .lineWidth(1)
      .dash(4, { space: 3 })
      .moveTo(this.left, this.y)
      .lineTo(this.left + this.width, this.y)
      .stroke(ACCENT)
      .undash();
    this.gap(5);
  }

  private text(value: string, options: { size: number; bold?: boolean; colour?: string; indent?: number }): void {
    const indent = options.indent ?? 0;
    this.doc.font(options.bold ? FONT_BOLD : FONT).fontSize(options.size);
    const height = this.doc.heightOfString(value, { width: this.width - indent });
    this.ensure(height);
    this.doc.fillColor(options.colour ?? INK).text(value, this.left + indent, this.y, { width: this.width - indent });
    this.y += height + 2;
  }

  private gap(points: number): void {
    this.y += points;
  }

  private ensure(points: number): void {
    if (this.y + points <= this.doc.page.height - this.left) return;
    this.doc.addPage();
    this.y = this.left;
  }
}
