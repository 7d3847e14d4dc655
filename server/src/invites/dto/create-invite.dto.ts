import { ApiProperty } from '@nestjs/swagger';
import { emailSchema, ROLES, roleSchema, type Role } from '@pondwright/shared';
import { MatchesSchema } from '../../common/validation/zod-validators';

export class CreateInviteDto {
  @ApiProperty({ example: 'new.estimator@example.test' })
  @MatchesSchema(emailSchema)
  email: string;

  @ApiProperty({ enum: ROLES })
  @MatchesSchema(roleSchema)
  role: Role;
}

export class PendingInviteDto {
  @ApiProperty() id: string;
  @ApiProperty() email: string;
  @ApiProperty({ enum: ROLES }) role: Role;
  @ApiProperty() expiresAt: string;
  @ApiProperty() createdAt: string;
  @ApiProperty() invitedByName: string;
}

export class CreatedInviteDto extends PendingInviteDto {
  @ApiProperty({ description: 'The link to pass on to the invitee; shown once' })
  inviteUrl: string;
}
