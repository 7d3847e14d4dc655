import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { companyNameSchema, unitSystemSchema, type CompanyProfile } from '@pondwright/shared';
import { IsOptional } from 'class-validator';
import { MatchesSchema } from '../../common/validation/zod-validators';

export class UpdateCompanyDto {
  @ApiPropertyOptional({ example: 'Heronmoss Water Gardens' })
  @IsOptional()
  @MatchesSchema(companyNameSchema)
  name?: string;

  @ApiPropertyOptional({ enum: ['us', 'metric'] })
  @IsOptional()
  @MatchesSchema(unitSystemSchema)
  unitSystem?: CompanyProfile['unitSystem'];
}

export class CompanyProfileDto {
  @ApiProperty() id: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: ['us', 'metric'] }) unitSystem: string;
  @ApiProperty() hasLogo: boolean;
}
