import { BadRequestException, Injectable } from '@nestjs/common';
import {
  computeTakeoff,
  takeoffInputSchema,
  toFieldErrors,
  type Takeoff,
  type TakeoffInput,
} from '@pondwright/shared/engine';
import { insetPolygon } from '@pondwright/shared/engine/polygon-inset';
import {
  diffPriceBooks,
  diffPricedEstimates,
  engineParametersFromPriceBook,
  priceTakeoff,
  type PricedEstimate,
  type PriceBook,
} from '@pondwright/shared/pricing';
import { TenantRepositories, type TenantRepository } from '../common/tenancy/tenant-repository';
import type { PriceBookVersion } from '../price-book/entities/price-book-version.entity';
import { PriceBookService } from '../price-book/price-book.service';
import {
  createPricedTakeoffRequestSchema,
  type PricedTakeoffListItem,
  type PricedTakeoffView,
  type PricedWithVersion,
  type RepricePreview,
} from './dto/priced-takeoff.dto';
import { PricedTakeoff } from './entities/priced-takeoff.entity';

type Priced = { input: TakeoffInput; takeoff: Takeoff; priced: PricedEstimate };

/**
 * Saved takeoffs priced against a price-book version. A saved one keeps its version's prices; re-pricing
 * with the book in effect today happens only when asked, after a preview of what would change.
 */
@Injectable()
export class PricedTakeoffsService {
  private readonly pricedTakeoffs: TenantRepository<PricedTakeoff>;

  constructor(
    repositories: TenantRepositories,
    private readonly priceBook: PriceBookService,
  ) {
    this.pricedTakeoffs = repositories.for(PricedTakeoff);
  }

  async create(body: unknown, createdById: string): Promise<PricedTakeoffView> {
    const request = createPricedTakeoffRequestSchema.safeParse(body);
    if (!request.success) throw fieldErrors(toFieldErrors(request.error.issues));
    const version = await this.priceBook.currentVersion();
    const result = price(request.data.input, version.content);
    const saved = await this.pricedTakeoffs.save(
      this.pricedTakeoffs.create({
        name: request.data.name,
        ...result,
        priceBookVersionId: version.id,
        createdById,
        repricedAt: null,
      }),
    );
    return this.get(saved.id);
  }

  async list(): Promise<PricedTakeoffListItem[]> {
    const rows = await this.pricedTakeoffs.find({
      relations: { priceBookVersion: true },
      order: { createdAt: 'DESC' },
    });
    return rows.map((row) => ({
      id: row.id,
      name: row.name,
      total: row.priced.totals.total,
      versionNumber: row.priceBookVersion!.versionNumber,
      createdAt: row.createdAt.toISOString(),
      repricedAt: row.repricedAt?.toISOString() ?? null,
    }));
  }

  async get(id: string): Promise<PricedTakeoffView> {
    return toView(await this.load(id));
  }

  /** What re-pricing with today's book would change, without changing anything. */
  async repricePreview(id: string): Promise<RepricePreview> {
    const row = await this.load(id);
    const latest = await this.priceBook.currentVersion();
    const repriced = price(row.input, latest.content);
    return {
      currentVersion: versionRef(row.priceBookVersion!),
      latestVersion: versionRef(latest),
      upToDate: latest.id === row.priceBookVersionId,
      bookChanges: diffPriceBooks(row.priceBookVersion!.content, latest.content),
      estimateChanges: diffPricedEstimates(row.priced, repriced.priced),
      currentTotal: row.priced.totals.total,
      newTotal: repriced.priced.totals.total,
    };
  }

  /** Re-prices on purpose with the book in effect today; the takeoff is recomputed with its rates too. */
  async reprice(id: string): Promise<PricedTakeoffView> {
    const row = await this.load(id);
    const latest = await this.priceBook.currentVersion();
    const repriced = price(row.input, latest.content);
    row.takeoff = repriced.takeoff;
    row.priced = repriced.priced;
    row.priceBookVersionId = latest.id;
    row.priceBookVersion = undefined;
    row.repricedAt = new Date();
    await this.pricedTakeoffs.save(row);
    return this.get(id);
  }

  private async load(id: string): Promise<PricedTakeoff> {
    const found = await this.pricedTakeoffs.getById(id, 'Priced takeoff');
    const [row] = await this.pricedTakeoffs.find({
      where: { id: found.id },
      relations: { priceBookVersion: true, createdBy: true },
    });
    return row!;
  }
}

/** The takeoff with the book's rates and pumps, then its price; input problems name `input.<path>`. */
function price(input: unknown, book: PriceBook): Priced {
  const result = computeTakeoff(input, engineParametersFromPriceBook(book), { insetPolygon });
  if (!result.ok) {
    throw fieldErrors(
      result.errors.map((error) => ({
        field: error.field === 'input' ? 'input' : `input.${error.field}`,
        message: error.message,
      })),
    );
  }
  const validInput = takeoffInputSchema.parse(input);
  return {
    input: validInput,
    takeoff: result.takeoff,
    priced: priceTakeoff({ input: validInput, takeoff: result.takeoff, book }),
  };
}

function fieldErrors(details: Array<{ field: string; message: string }>): BadRequestException {
  return new BadRequestException({
    message: details.length === 1 ? details[0]!.message : 'Some fields need attention',
    details,
  });
}

function versionRef(version: PriceBookVersion): PricedWithVersion {
  return {
    id: version.id,
    versionNumber: version.versionNumber,
    effectiveDate: version.effectiveDate,
  };
}

function toView(row: PricedTakeoff): PricedTakeoffView {
  return {
    id: row.id,
    name: row.name,
    input: row.input,
    takeoff: row.takeoff,
    priced: row.priced,
    priceBookVersion: versionRef(row.priceBookVersion!),
    createdByName: row.createdBy?.name ?? '',
    createdAt: row.createdAt.toISOString(),
    repricedAt: row.repricedAt?.toISOString() ?? null,
  };
}
