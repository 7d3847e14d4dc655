import {
  Body,
  Controller,
  Delete,
  Get,
  Headers,
  Patch,
  Put,
  Res,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { CompanyProfile, CompanyQuoteTerms } from '@pondwright/shared';
import type { Response } from 'express';
import {
  ApiFileResponse,
  ApiJsonResponse,
  ApiUploadBody,
} from '../common/decorators/api-docs.decorators';
import { AnyRole, Roles } from '../common/decorators/auth.decorators';
import { CompaniesService, MAX_LOGO_BYTES } from './companies.service';
import { quoteTermsBodyDoc } from './dto/quote-terms.dto';
import { CompanyProfileDto, UpdateCompanyDto } from './dto/update-company.dto';

@ApiTags('company')
@ApiBearerAuth()
@Controller('company')
export class CompaniesController {
  constructor(private readonly companies: CompaniesService) {}

  @AnyRole()
  @Get()
  @ApiOkResponse({ type: CompanyProfileDto })
  current(): Promise<CompanyProfile> {
    return this.companies.current();
  }

  @Roles('owner')
  @Patch()
  @ApiOkResponse({ type: CompanyProfileDto })
  update(@Body() body: UpdateCompanyDto): Promise<CompanyProfile> {
    return this.companies.update(body);
  }

  @AnyRole()
  @Get('quote-terms')
  @ApiJsonResponse(
    200,
    'CompanyQuoteTerms',
    'The terms printed on quotes, and whether they are the default',
  )
  quoteTerms(): Promise<CompanyQuoteTerms> {
    return this.companies.quoteTerms();
  }

  /** Body: `updateQuoteTermsSchema` (validated with the shared zod schema in the service). */
  @Roles('owner')
  @Put('quote-terms')
  @ApiBody({ schema: quoteTermsBodyDoc })
  @ApiJsonResponse(200, 'CompanyQuoteTerms', 'The terms now printed on quotes')
  setQuoteTerms(@Body() body: unknown): Promise<CompanyQuoteTerms> {
    return this.companies.setQuoteTerms(body);
  }

  /**
   * Multipart field `logo`. Multer stops reading one byte past the limit, so an oversized upload is
   * refused without being held in memory whole.
   */
  @Roles('owner')
  @Put('logo')
  @ApiConsumes('multipart/form-data')
  @ApiUploadBody('logo')
  @UseInterceptors(
    FileInterceptor('logo', { limits: { fileSize: MAX_LOGO_BYTES + 1, files: 1, fields: 0 } }),
  )
  @ApiOkResponse({ type: CompanyProfileDto })
  setLogo(
    @UploadedFile() file: { buffer: Buffer; size: number } | undefined,
  ): Promise<CompanyProfile> {
    return this.companies.setLogo(file);
  }

  @Roles('owner')
  @Delete('logo')
  @ApiOkResponse({ type: CompanyProfileDto })
  removeLogo(): Promise<CompanyProfile> {
    return this.companies.removeLogo();
  }

  @AnyRole()
  @Get('logo')
  @ApiFileResponse('image/*', 'The company’s logo (PNG or JPEG), with an ETag; 304 when unchanged')
  async logo(
    @Headers('if-none-match') ifNoneMatch: string | undefined,
    @Res() response: Response,
  ): Promise<void> {
    const logo = await this.companies.logo();
    const etag = `"${logo.sha256}"`;
    response.setHeader('ETag', etag).setHeader('Cache-Control', 'private, no-cache');
    if (ifNoneMatch === etag) {
      response.status(304).end();
      return;
    }
    response.status(200).type(logo.contentType).send(logo.bytes);
  }
}
