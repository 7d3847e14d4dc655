import { BadRequestException, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { Role } from '@pondwright/shared';
import { toFieldErrors } from '@pondwright/shared/engine';
import {
  diffPriceBooks,
  markupToMarginPct,
  PRICE_CATEGORIES,
  priceBookFromCsv,
  priceBookSchema,
  priceBookToCsv,
  type PriceBook,
  type PriceBookChange,
  type PriceCategory,
} from '@pondwright/shared/pricing';
import { DataSource, LessThanOrEqual } from 'typeorm';
import type { z } from 'zod';
import { AppError } from '../common/errors/app-error';
import { TenantContext } from '../common/tenancy/tenant-context';
import { TenantRepositories, type TenantRepository } from '../common/tenancy/tenant-repository';
import {
  importPriceBookRequestSchema,
  savePolicyRequestSchema,
  savePriceBookRequestSchema,
  type CsvImportProblem,
  type MaterialsView,
  type PriceBookVersionListItem,
  type PriceBookVersionStatus,
  type PriceBookVersionSummary,
  type PriceBookVersionView,
  type PricingPolicyView,
} from './dto/price-book.dto';
import { todayIsoDate } from './effective-date';
import { PriceBookVersion } from './entities/price-book-version.entity';
import { savePriceBookVersion } from './save-price-book-version';

const NO_PRICE_BOOK =
  'Your company has no price book in effect yet. The owner can add one under Price book.';

/**
 * The company's price book: immutable, numbered versions with an effective date. Owners save new
 * versions (whole book, policy only, or a CSV import); everyone else reads. Crew leads only ever reach
 * the cost-free materials list.
 */
@Injectable()
export class PriceBookService {
  private readonly versions: TenantRepository<PriceBookVersion>;

  constructor(
    repositories: TenantRepositories,
    private readonly tenant: TenantContext,
    @InjectDataSource() private readonly dataSource: DataSource,
  ) {
    this.versions = repositories.for(PriceBookVersion);
  }

  /** The version pricing new work today: the latest effective date not after today, then the highest number. */
  async currentVersion(): Promise<PriceBookVersion> {
    const version = await this.versionInForceOn(todayIsoDate());
    if (!version) throw new AppError('PRICE_BOOK_NOT_FOUND', NO_PRICE_BOOK);
    return version;
  }

  async getVersionEntity(id: string): Promise<PriceBookVersion> {
    const version = await this.versions.getById(id, 'Price-book version');
    return this.withAuthor(version);
  }

  async current(): Promise<PriceBookVersionView> {
    const version = await this.withAuthor(await this.currentVersion());
    return toView(version, version.id);
  }

  async listVersions(): Promise<PriceBookVersionListItem[]> {
    const rows = await this.versions.find({
      relations: { author: true },
      order: { versionNumber: 'ASC' },
    });
    const currentId = currentIdOf(rows);
    return rows
      .map((row, index) => ({
        ...toSummary(row, currentId),
        changeCount: index === 0 ? 0 : diffPriceBooks(rows[index - 1]!.content, row.content).length,
      }))
      .reverse();
  }

  async getVersion(id: string): Promise<PriceBookVersionView> {
    const version = await this.getVersionEntity(id);
    return toView(version, (await this.versionInForceOn(todayIsoDate()))?.id);
  }

  /** What this version changed against the one numbered before it; nothing for version 1. */
  async versionChanges(id: string): Promise<PriceBookChange[]> {
    const version = await this.versions.getById(id, 'Price-book version');
    if (version.versionNumber === 1) return [];
    const previous = await this.versions.findOneBy({ versionNumber: version.versionNumber - 1 });
    return previous ? diffPriceBooks(previous.content, version.content) : [];
  }

  async save(body: unknown, authorId: string): Promise<PriceBookVersionView> {
    const request = parseRequest(savePriceBookRequestSchema, body);
    return this.append(authorId, {
      book: request.book,
      effectiveDate: request.effectiveDate,
      note: request.note,
    });
  }

  async policy(): Promise<PricingPolicyView> {
    const version = await this.currentVersion();
    const policy = version.content.policy;
    return {
      versionId: version.id,
      versionNumber: version.versionNumber,
      effectiveDate: version.effectiveDate,
      policy,
      marginPct: Object.fromEntries(
        PRICE_CATEGORIES.map((category) => [
          category,
          markupToMarginPct(policy.markupPct[category]),
        ]),
      ) as Record<PriceCategory, string>,
    };
  }

  /**
   * A new version that changes only the policy of the book in force on the new version's date, so a price
   * change already scheduled for that date is kept rather than undone.
   */
  async savePolicy(body: unknown, authorId: string): Promise<PriceBookVersionView> {
    const request = parseRequest(savePolicyRequestSchema, body);
    const effectiveDate = request.effectiveDate ?? todayIsoDate();
    const base = await this.versionInForceOn(effectiveDate);
    if (!base) throw new AppError('PRICE_BOOK_NOT_FOUND', NO_PRICE_BOOK);
    return this.append(authorId, {
      book: { ...base.content, policy: request.policy },
      effectiveDate,
      note: request.note ?? 'Pricing policy changed',
    });
  }

  /** A new version, effective today, that changes one production rate (a learned rate adopted). */
  async adoptProductionRate(
    parameter: keyof PriceBook['productionRates'],
    value: number,
    note: string,
    authorId: string,
  ): Promise<PriceBookVersionView> {
    const effectiveDate = todayIsoDate();
    const base = await this.versionInForceOn(effectiveDate);
    if (!base) throw new AppError('PRICE_BOOK_NOT_FOUND', NO_PRICE_BOOK);
    return this.append(authorId, {
      book: {
        ...base.content,
        productionRates: { ...base.content.productionRates, [parameter]: value },
      },
      effectiveDate,
      note,
    });
  }

  async exportCsv(): Promise<{ filename: string; csv: string }> {
    const version = await this.currentVersion();
    return {
      filename: `price-book-v${version.versionNumber}-${version.effectiveDate}.csv`,
      csv: priceBookToCsv(version.content),
    };
  }

  /** All or nothing: any bad row refuses the whole file and lists every problem by line and column. */
  async importCsv(body: unknown, authorId: string): Promise<PriceBookVersionView> {
    const request = parseRequest(importPriceBookRequestSchema, body);
    const parsed = priceBookFromCsv(request.csv);
    if (!parsed.ok) {
      const details: CsvImportProblem[] = parsed.errors.map((error) => ({
        field: csvPlace(error.line, error.column),
        line: error.line,
        column: error.column,
        message: error.message,
      }));
      const lines = new Set(parsed.errors.map((error) => error.line)).size;
      throw new BadRequestException({
        message: `${lines === 1 ? '1 line has' : `${lines} lines have`} problems; nothing was imported`,
        details,
      });
    }
    // The CSV reader checks the book itself; this is the last word before anything is stored.
    const book = parseRequest(priceBookSchema, parsed.book);
    return this.append(authorId, {
      book,
      effectiveDate: request.effectiveDate,
      note: request.note ?? 'Imported from CSV',
    });
  }

  /** The current materials; a crew lead's copy carries no costs. */
  async materials(role: Role): Promise<MaterialsView> {
    const version = await this.currentVersion();
    const materials = version.content.materials;
    return {
      versionNumber: version.versionNumber,
      effectiveDate: version.effectiveDate,
      materials:
        role === 'crew_lead'
          ? materials.map(({ unitCost: _unitCost, ...rest }) => rest)
          : materials,
    };
  }

  private async append(
    authorId: string,
    version: { book: PriceBook; effectiveDate?: string; note?: string },
  ): Promise<PriceBookVersionView> {
    const companyId = this.tenant.companyId;
    const saved = await this.dataSource.transaction((manager) =>
      savePriceBookVersion(manager, { companyId, authorId, ...version }),
    );
    const withAuthor = await this.withAuthor(saved);
    return toView(withAuthor, (await this.versionInForceOn(todayIsoDate()))?.id);
  }

  private async versionInForceOn(date: string): Promise<PriceBookVersion | null> {
    // Without the author: joined under `take`, TypeORM runs two queries (the ids, then the rows), and
    // every estimate save prices with this book (npm run bench). `current` adds the author it shows.
    const [version] = await this.versions.find({
      where: { effectiveDate: LessThanOrEqual(date) },
      order: { effectiveDate: 'DESC', versionNumber: 'DESC' },
      take: 1,
    });
    return version ?? null;
  }

  private async withAuthor(version: PriceBookVersion): Promise<PriceBookVersion> {
    if (version.author) return version;
    const [loaded] = await this.versions.find({
      where: { id: version.id },
      relations: { author: true },
    });
    return loaded!;
  }
}

/** Validates a body with a zod schema; problems become a 400 with one message per dotted field path. */
function parseRequest<T extends z.ZodType>(schema: T, body: unknown): z.infer<T> {
  const result = schema.safeParse(body);
  if (result.success) return result.data;
  const details = toFieldErrors(result.error.issues);
  throw new BadRequestException({
    message: details.length === 1 ? details[0]!.message : 'Some fields need attention',
    details,
  });
}

/** "line 7, column unitCost"; line 0 is a row the file lacks altogether (e.g. a missing setting). */
function csvPlace(line: number, column: string): string {
  if (line === 0) return column ? `missing row, column ${column}` : 'missing row';
  return column ? `line ${line}, column ${column}` : `line ${line}`;
}

function currentIdOf(rowsByNumber: PriceBookVersion[]): string | undefined {
  const today = todayIsoDate();
  let current: PriceBookVersion | undefined;
  for (const row of rowsByNumber) {
    if (row.effectiveDate <= today && (!current || row.effectiveDate >= current.effectiveDate)) {
      current = row;
    }
  }
  return current?.id;
}

function statusOf(
  version: PriceBookVersion,
  currentId: string | undefined,
): PriceBookVersionStatus {
  if (version.id === currentId) return 'current';
  return version.effectiveDate > todayIsoDate() ? 'scheduled' : 'superseded';
}

function toSummary(
  version: PriceBookVersion,
  currentId: string | undefined,
): PriceBookVersionSummary {
  return {
    id: version.id,
    versionNumber: version.versionNumber,
    effectiveDate: version.effectiveDate,
    status: statusOf(version, currentId),
    authorName: version.author?.name ?? '',
    note: version.note,
    createdAt: version.createdAt.toISOString(),
  };
}

function toView(version: PriceBookVersion, currentId: string | undefined): PriceBookVersionView {
  return { ...toSummary(version, currentId), book: version.content };
}
