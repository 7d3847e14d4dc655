import { BadRequestException, Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { CompanyProfile } from '@pondwright/shared';
import { Repository } from 'typeorm';
import { TenantContext } from '../common/tenancy/tenant-context';
import type { UpdateCompanyDto } from './dto/update-company.dto';
import { Company } from './entities/company.entity';

/** The caller's own company: the tenant itself, so it is found by the request's company id. */
@Injectable()
export class CompaniesService {
  constructor(
    @InjectRepository(Company) private readonly companies: Repository<Company>,
    private readonly tenant: TenantContext,
  ) {}

  async current(): Promise<CompanyProfile> {
    return toProfile(await this.companies.findOneByOrFail({ id: this.tenant.companyId }));
  }

  async update(change: UpdateCompanyDto): Promise<CompanyProfile> {
    if (change.name === undefined && change.unitSystem === undefined) {
      throw new BadRequestException('Change the name or the unit system');
    }
    const company = await this.companies.findOneByOrFail({ id: this.tenant.companyId });
    if (change.name !== undefined) company.name = change.name;
    if (change.unitSystem !== undefined) company.unitSystem = change.unitSystem;
    return toProfile(await this.companies.save(company));
  }
}

function toProfile(company: Company): CompanyProfile {
  return { id: company.id, name: company.name, unitSystem: company.unitSystem };
}
