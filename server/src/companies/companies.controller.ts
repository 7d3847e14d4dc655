import { Body, Controller, Get, Patch } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { CompanyProfile } from '@pondwright/shared';
import { AnyRole, Roles } from '../common/decorators/auth.decorators';
import { CompaniesService } from './companies.service';
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
}
