import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ROLES, roleSchema, type Role } from '@pondwright/shared';
import { IsBoolean, IsOptional } from 'class-validator';
import { MatchesSchema } from '../../common/validation/zod-validators';

export class UpdateUserDto {
  @ApiPropertyOptional({ enum: ROLES })
  @IsOptional()
  @MatchesSchema(roleSchema)
  role?: Role;

  @ApiPropertyOptional({ description: 'false deactivates the member and ends their sessions' })
  @IsOptional()
  @IsBoolean({ message: 'active must be true or false' })
  active?: boolean;
}

export class TeamMemberDto {
  @ApiProperty() id: string;
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: ROLES }) role: Role;
  @ApiProperty() active: boolean;
  @ApiProperty() createdAt: string;
}
