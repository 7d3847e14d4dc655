import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CompaniesController } from './companies.controller';
import { CompaniesService } from './companies.service';
import { CompanyLogo } from './entities/company-logo.entity';
import { Company } from './entities/company.entity';

@Module({
  imports: [TypeOrmModule.forFeature([Company, CompanyLogo])],
  controllers: [CompaniesController],
  providers: [CompaniesService],
})
export class CompaniesModule {}
