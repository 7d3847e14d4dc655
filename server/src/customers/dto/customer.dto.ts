import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  accessWidthInSchema,
  carryDistanceFtSchema,
  createSiteSchema,
  CUSTOMER_SORTS,
  customerEmailSchema,
  customerNameSchema,
  customerNotesSchema,
  customerPhoneSchema,
  customerSearchSchema,
  customerSortSchema,
  pageSchema,
  pageSizeSchema,
  powerAvailableSchema,
  siteAddressLineSchema,
  siteCitySchema,
  siteLabelSchema,
  siteNotesSchema,
  sitePostalCodeSchema,
  siteRegionSchema,
  slopePctSchema,
  soilSchema,
  SORT_ORDERS,
  sortOrderSchema,
  utilitiesLocatedSchema,
  waterAvailableSchema,
  type CreateSiteInput,
  type CustomerSort,
  type SiteView,
  type SortOrder,
} from '@pondwright/shared';
import { IsOptional, ValidateIf } from 'class-validator';
import { z } from 'zod';
import { MatchesSchema } from '../../common/validation/zod-validators';

/**
 * An optional field checked only when it is sent. Unlike `@IsOptional`, a null is still checked, so
 * `{"name": null}` is refused with the schema's message instead of reaching the database.
 */
function WhenSent(): PropertyDecorator {
  return ValidateIf((_object: object, value: unknown) => value !== undefined);
}

const SOILS = ['sand-gravel', 'loam', 'clay'];

export class CreateSiteDto {
  @ApiPropertyOptional({ example: 'Back garden' })
  @WhenSent()
  @MatchesSchema(siteLabelSchema)
  label?: string;

  @ApiProperty({ example: '14 Alder Row' })
  @MatchesSchema(siteAddressLineSchema)
  addressLine: string;

  @ApiPropertyOptional() @WhenSent() @MatchesSchema(siteCitySchema) city?: string;
  @ApiPropertyOptional() @WhenSent() @MatchesSchema(siteRegionSchema) region?: string;
  @ApiPropertyOptional() @WhenSent() @MatchesSchema(sitePostalCodeSchema) postalCode?: string;

  @ApiPropertyOptional({
    type: Number,
    nullable: true,
    description: 'Narrowest gate or path, inches',
  })
  @WhenSent()
  @MatchesSchema(accessWidthInSchema)
  accessWidthIn?: number | null;

  @ApiPropertyOptional({
    type: Number,
    nullable: true,
    description: 'From where trucks stop, feet',
  })
  @WhenSent()
  @MatchesSchema(carryDistanceFtSchema)
  carryDistanceFt?: number | null;

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Percent, 0–100' })
  @WhenSent()
  @MatchesSchema(slopePctSchema)
  slopePct?: number | null;

  @ApiPropertyOptional({ enum: SOILS, nullable: true })
  @WhenSent()
  @MatchesSchema(soilSchema)
  soil?: SiteView['soil'];

  @ApiPropertyOptional({ type: Boolean, nullable: true })
  @WhenSent()
  @MatchesSchema(waterAvailableSchema)
  waterAvailable?: boolean | null;

  @ApiPropertyOptional({ type: Boolean, nullable: true })
  @WhenSent()
  @MatchesSchema(powerAvailableSchema)
  powerAvailable?: boolean | null;

  @ApiPropertyOptional({ description: 'Utility locates requested and marked before digging' })
  @WhenSent()
  @MatchesSchema(utilitiesLocatedSchema)
  utilitiesLocated?: boolean;

  @ApiPropertyOptional() @WhenSent() @MatchesSchema(siteNotesSchema) notes?: string;
}

export class UpdateSiteDto extends CreateSiteDto {
  @ApiPropertyOptional({ example: '14 Alder Row' })
  @WhenSent()
  @MatchesSchema(siteAddressLineSchema)
  declare addressLine: string;
}

export class CreateCustomerDto {
  @ApiProperty({ example: 'Marlow Fenwick' })
  @MatchesSchema(customerNameSchema)
  name: string;

  @ApiPropertyOptional() @WhenSent() @MatchesSchema(customerPhoneSchema) phone?: string;
  @ApiPropertyOptional() @WhenSent() @MatchesSchema(customerEmailSchema) email?: string;
  @ApiPropertyOptional() @WhenSent() @MatchesSchema(customerNotesSchema) notes?: string;

  @ApiPropertyOptional({
    type: [CreateSiteDto],
    description: 'Sites saved with the customer, all or nothing',
  })
  @WhenSent()
  @MatchesSchema(
    z
      .array(createSiteSchema, { error: 'Sites must be a list' })
      .max(20, 'Add at most 20 sites at once'),
  )
  sites?: CreateSiteInput[];
}

export class UpdateCustomerDto {
  @ApiPropertyOptional() @WhenSent() @MatchesSchema(customerNameSchema) name?: string;
  @ApiPropertyOptional() @WhenSent() @MatchesSchema(customerPhoneSchema) phone?: string;
  @ApiPropertyOptional() @WhenSent() @MatchesSchema(customerEmailSchema) email?: string;
  @ApiPropertyOptional() @WhenSent() @MatchesSchema(customerNotesSchema) notes?: string;
}

export class CustomerListQueryDto {
  @ApiPropertyOptional({ description: 'Part of a name, e-mail or phone number' })
  @IsOptional()
  @MatchesSchema(customerSearchSchema)
  q?: string;

  @ApiPropertyOptional({ enum: CUSTOMER_SORTS, default: 'name' })
  @IsOptional()
  @MatchesSchema(customerSortSchema)
  sort?: CustomerSort;

  @ApiPropertyOptional({ enum: SORT_ORDERS, default: 'asc' })
  @IsOptional()
  @MatchesSchema(sortOrderSchema)
  order?: SortOrder;

  @ApiPropertyOptional({ minimum: 1, default: 1 })
  @IsOptional()
  @MatchesSchema(pageSchema)
  page?: number;

  @ApiPropertyOptional({ minimum: 10, maximum: 100, default: 25 })
  @IsOptional()
  @MatchesSchema(pageSizeSchema)
  pageSize?: number;
}
