/**
 * The studio's garments with their sizes and fabric colours. A garment is retired, never deleted: designs and
 * orders keep pointing at it. Its sizes and colours may be deleted while nothing uses them.
 */
import type { Db } from '../../db/knex.ts';
import { garmentIdExists } from './garment-repo.ts';
import { mockupSizeMm } from '../../engine/garment-mockup-size.ts';
import { listStudioGarments } from './studio-garment-repo.ts';
import type {
  CreateGarmentRequest,
  FabricColourRequest,
  GarmentSizeRequest,
  UpdateGarmentRequest,
} from '../../contracts/admin-catalogue-garments.ts';
import type { CatalogueRowRef } from '../../contracts/admin-catalogue-common.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import type { HeavyWork } from '../../integrations/heavy-work.ts';
import { cleanSvgOffThread } from '../../integrations/inspect-upload-job.ts';
import {
  createCatalogueRow,
  editCatalogueRow,
  removeCatalogueRow,
  setCatalogueRowActive,
  type RowWording,
} from './catalogue-rows.ts';

export const garmentWording: RowWording = {
  noun: 'garment',
  uniqueField: 'slug',
  duplicateMessage: 'Another garment already uses this web address name',
};
const sizeWording: RowWording = {
  noun: 'size',
  uniqueField: 'code',
  duplicateMessage: 'This garment already has a size with this code',
};
const colourWording: RowWording = {
  noun: 'fabric colour',
  uniqueField: 'name',
  duplicateMessage: 'This garment already has a colour with this name',
};

/** The drawing sanitized like any upload, and only if the storefront can size it (a viewBox or width/height in mm). */
async function cleanMockup(work: HeavyWork, svg: string): Promise<Result<string>> {
  const inspected = await cleanSvgOffThread(work, Buffer.from(svg, 'utf8'));
  if (!inspected.ok)
    return failure(inspected.error.kind, inspected.error.message, { mockupSvg: inspected.error.message });
  try {
    mockupSizeMm(inspected.value, 'new');
  } catch {
    const message = 'Draw the garment with a viewBox in millimetres, like viewBox="0 0 300 400"';
    return failure('invalid', `${message}.`, { mockupSvg: message });
  }
  return ok(inspected.value);
}

function garmentRow(garment: UpdateGarmentRequest) {
  return {
    name: garment.name,
    kind: garment.kind,
    description: garment.description,
    fabric_type: garment.fabricType,
    is_napped: garment.isNapped,
    min_age_months: garment.minAgeMonths,
    max_age_months: garment.maxAgeMonths,
    tie_places: JSON.stringify([...new Set(garment.tiePlaces)]),
    drawstring_places: JSON.stringify([...new Set(garment.drawstringPlaces)]),
    closure: garment.closure,
    closes_at_neck: garment.closesAtNeck,
    intended_use: garment.intendedUse,
    ...(garment.sortOrder === undefined ? {} : { sort_order: garment.sortOrder }),
  };
}

function sizeRow(size: GarmentSizeRequest) {
  return {
    code: size.code,
    label: size.label,
    hem_front_mm: size.hemFrontMm,
    hem_circumference_mm: size.hemCircumferenceMm,
    min_age_months: size.minAgeMonths,
    max_age_months: size.maxAgeMonths,
    mockup_scale: size.mockupScale,
    placement_zones: JSON.stringify(size.zones),
    ...(size.sortOrder === undefined ? {} : { sort_order: size.sortOrder }),
  };
}

function colourRow(colour: FabricColourRequest) {
  return {
    name: colour.name,
    hex: colour.hex,
    ...(colour.sortOrder === undefined ? {} : { sort_order: colour.sortOrder }),
  };
}

/** The parts of a garment, each in its own table under the garment. */
export type GarmentPart = 'sizes' | 'colours';
interface PartRequest {
  sizes: GarmentSizeRequest;
  colours: FabricColourRequest;
}

const parts: {
  [P in GarmentPart]: {
    table: 'garment_sizes' | 'fabric_colours';
    wording: RowWording;
    toRow: (request: PartRequest[P]) => Record<string, unknown>;
  };
} = {
  sizes: { table: 'garment_sizes', wording: sizeWording, toRow: sizeRow },
  colours: { table: 'fabric_colours', wording: colourWording, toRow: colourRow },
};

const noSuchGarment = () => failure('not-found', 'There is no such garment.');

export function createCatalogueGarmentService(deps: { db: Db; heavyWork: HeavyWork }) {
  const { db } = deps;

  /** A new garment, on sale at once; it needs sizes and colours before a customer can design on it. */
  async function create(request: CreateGarmentRequest): Promise<Result<CatalogueRowRef>> {
    const mockup = await cleanMockup(deps.heavyWork, request.mockupSvg);
    if (!mockup.ok) return mockup;
    return createCatalogueRow(
      db,
      'garments',
      { slug: request.slug, ...garmentRow(request), mockup_svg: mockup.value, is_active: true },
      garmentWording,
    );
  }

  async function update(id: number, request: UpdateGarmentRequest): Promise<Result<CatalogueRowRef>> {
    const mockup = request.mockupSvg === undefined ? undefined : await cleanMockup(deps.heavyWork, request.mockupSvg);
    if (mockup && !mockup.ok) return mockup;
    return editCatalogueRow(
      db,
      'garments',
      { id },
      { ...garmentRow(request), ...(mockup ? { mockup_svg: mockup.value } : {}) },
      garmentWording,
    );
  }

  /** Adds a size or a colour to a garment. */
  async function addPart<P extends GarmentPart>(
    part: P,
    garmentId: number,
    request: PartRequest[P],
  ): Promise<Result<CatalogueRowRef>> {
    if (!(await garmentIdExists(db, garmentId))) return noSuchGarment();
    return createCatalogueRow(
      db,
      parts[part].table,
      { garment_id: garmentId, ...parts[part].toRow(request) },
      parts[part].wording,
    );
  }

  async function updatePart<P extends GarmentPart>(
    part: P,
    garmentId: number,
    partId: number,
    request: PartRequest[P],
  ): Promise<Result<CatalogueRowRef>> {
    return editCatalogueRow(
      db,
      parts[part].table,
      { id: partId, garment_id: garmentId },
      parts[part].toRow(request),
      parts[part].wording,
    );
  }

  /** Deletes a size or colour of the garment; one a design or order uses answers `conflict` and stays. */
  async function removePart(part: GarmentPart, garmentId: number, partId: number): Promise<Result<CatalogueRowRef>> {
    return removeCatalogueRow(db, parts[part].table, { id: partId, garment_id: garmentId }, parts[part].wording);
  }

  const setActive = (id: number, isActive: boolean) =>
    setCatalogueRowActive(db, 'garments', id, isActive, garmentWording);

  return { create, update, addPart, updatePart, removePart, setActive, list: () => listStudioGarments(db) };
}
export type CatalogueGarmentService = ReturnType<typeof createCatalogueGarmentService>;
