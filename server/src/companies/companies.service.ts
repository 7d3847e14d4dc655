import { BadRequestException, Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import {
  DEFAULT_QUOTE_TERMS,
  updateQuoteTermsSchema,
  type CompanyProfile,
  type CompanyQuoteTerms,
} from '@pondwright/shared';
import { createHash } from 'node:crypto';
import sharp from 'sharp';
import { Repository } from 'typeorm';
import { AppError } from '../common/errors/app-error';
import { TenantContext } from '../common/tenancy/tenant-context';
import { parseBody } from '../common/validation/parse-body';
import type { UpdateCompanyDto } from './dto/update-company.dto';
import { CompanyLogo } from './entities/company-logo.entity';
import { Company } from './entities/company.entity';

/** The largest logo accepted: plenty for a crisp mark on a page, small enough to send with every PDF. */
export const MAX_LOGO_BYTES = 512 * 1024;

/** The caller's own company: the tenant itself, so it is found by the request's company id. */
@Injectable()
export class CompaniesService {
  constructor(
    @InjectRepository(Company) private readonly companies: Repository<Company>,
    @InjectRepository(CompanyLogo) private readonly logos: Repository<CompanyLogo>,
    private readonly tenant: TenantContext,
  ) {}

  async current(): Promise<CompanyProfile> {
    return this.profile(await this.companies.findOneByOrFail({ id: this.tenant.companyId }));
  }

  /**
   * Stores the logo after checking its bytes, not its name or declared type: a PNG starts with the
   * PNG signature (ISO/IEC 15948, 5.2), a JPEG with the SOI marker FF D8 FF (ITU-T T.81, B.1.1.2).
   */
  async setLogo(file: { buffer: Buffer; size: number } | undefined): Promise<CompanyProfile> {
    if (!file || file.size === 0) {
      throw new AppError('LOGO_INVALID', 'Choose a PNG or JPEG file', [
        { field: 'logo', message: 'Choose a PNG or JPEG file' },
      ]);
    }
    if (file.size > MAX_LOGO_BYTES) {
      throw new AppError('LOGO_INVALID', 'The logo is larger than 512 KB', [
        { field: 'logo', message: 'Use an image of at most 512 KB' },
      ]);
    }
    const contentType = imageTypeOf(file.buffer);
    if (!contentType) {
      throw new AppError('LOGO_INVALID', 'The logo must be a PNG or JPEG image', [
        { field: 'logo', message: 'Use a PNG or JPEG image' },
      ]);
    }
    const bytes = await reencodeLogo(file.buffer, contentType);
    await this.logos.save({
      companyId: this.tenant.companyId,
      contentType,
      bytes,
      sha256: createHash('sha256').update(bytes).digest('hex'),
      updatedAt: new Date(),
    });
    return this.current();
  }

  async removeLogo(): Promise<CompanyProfile> {
    await this.logos.delete({ companyId: this.tenant.companyId });
    return this.current();
  }

  async logo(): Promise<CompanyLogo> {
    const logo = await this.logos.findOneBy({ companyId: this.tenant.companyId });
    if (!logo) throw new AppError('LOGO_NOT_FOUND', 'Your company has no logo yet.');
    return logo;
  }

  private async profile(company: Company): Promise<CompanyProfile> {
    const hasLogo = await this.logos.existsBy({ companyId: company.id });
    return { id: company.id, name: company.name, unitSystem: company.unitSystem, hasLogo };
  }

  async quoteTerms(): Promise<CompanyQuoteTerms> {
    return termsView(await this.companies.findOneByOrFail({ id: this.tenant.companyId }));
  }

  /**
   * Saves the terms quotes are sent with from now on; quotes already sent keep theirs (each link holds
   * a copy). Null, or text identical to the default, means the built-in default, so the company follows
   * later improvements to it.
   */
  async setQuoteTerms(body: unknown): Promise<CompanyQuoteTerms> {
    const { terms } = parseBody(updateQuoteTermsSchema, body);
    await this.companies.update(
      { id: this.tenant.companyId },
      { quoteTerms: terms === null || terms === DEFAULT_QUOTE_TERMS ? null : terms },
    );
    return this.quoteTerms();
  }

  async update(change: UpdateCompanyDto): Promise<CompanyProfile> {
    if (change.name === undefined && change.unitSystem === undefined) {
      throw new BadRequestException('Change the name or the unit system');
    }
    const company = await this.companies.findOneByOrFail({ id: this.tenant.companyId });
    if (change.name !== undefined) company.name = change.name;
    if (change.unitSystem !== undefined) company.unitSystem = change.unitSystem;
    return this.profile(await this.companies.save(company));
  }
}

function termsView(company: Company): CompanyQuoteTerms {
  return {
    terms: company.quoteTerms ?? DEFAULT_QUOTE_TERMS,
    isDefault: company.quoteTerms === null,
  };
}

const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
/** Decoding bombs: a logo is small, so anything over 16 megapixels is refused (the PDF's own cap). */
const MAX_LOGO_PIXELS = 16_000_000;

/**
 * The logo decoded and encoded again in its own format, turned upright first. The first bytes alone
 * let through a file that merely starts like a PNG or JPEG (an HTML or PHP page behind the
 * signature), and the bytes as sent kept their EXIF, GPS position included, for every homeowner who
 * opened a quote (security review): sharp writes no metadata unless asked, and drops anything hidden
 * after the image. PNG stays lossless; a JPEG is written at quality 90 so the mark stays crisp.
 */
async function reencodeLogo(
  input: Buffer,
  contentType: CompanyLogo['contentType'],
): Promise<Buffer> {
  try {
    const image = sharp(input, { limitInputPixels: MAX_LOGO_PIXELS }).rotate();
    return await (
      contentType === 'image/png' ? image.png({ compressionLevel: 9 }) : image.jpeg({ quality: 90 })
    ).toBuffer();
  } catch {
    throw new AppError('LOGO_INVALID', 'The logo could not be opened; it may be damaged', [
      { field: 'logo', message: 'Use a PNG or JPEG image' },
    ]);
  }
}

function imageTypeOf(bytes: Buffer): CompanyLogo['contentType'] | null {
  if (bytes.subarray(0, 8).equals(PNG_SIGNATURE)) return 'image/png';
  if (bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return 'image/jpeg';
  return null;
}
