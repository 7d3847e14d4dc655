import { ApiProperty } from '@nestjs/swagger';
import {
  acceptInviteSchema,
  companyNameSchema,
  emailSchema,
  loginSchema,
  passwordSchema,
  personNameSchema,
} from '@pondwright/shared';
import { MatchesSchema } from '../../common/validation/zod-validators';
import { IsNotCommonPassword } from '../common-passwords';

export class SignupDto {
  @ApiProperty({ example: 'Mossgate Water Gardens' })
  @MatchesSchema(companyNameSchema)
  companyName: string;

  @ApiProperty({ example: 'Rowan Pell' })
  @MatchesSchema(personNameSchema)
  name: string;

  @ApiProperty({ example: 'rowan@example.test' })
  @MatchesSchema(emailSchema)
  email: string;

  @ApiProperty({ minLength: 8, maxLength: 128 })
  @MatchesSchema(passwordSchema)
  @IsNotCommonPassword()
  password: string;
}

export class LoginDto {
  @ApiProperty({ example: 'rowan@example.test' })
  @MatchesSchema(loginSchema.shape.email)
  email: string;

  @ApiProperty()
  @MatchesSchema(loginSchema.shape.password)
  password: string;
}

export class AcceptInviteDto {
  @ApiProperty()
  @MatchesSchema(acceptInviteSchema.shape.token)
  token: string;

  @ApiProperty({ example: 'Sam Ketter' })
  @MatchesSchema(personNameSchema)
  name: string;

  @ApiProperty({ minLength: 8, maxLength: 128 })
  @MatchesSchema(passwordSchema)
  @IsNotCommonPassword()
  password: string;
}

export class AccessTokenDto {
  @ApiProperty({ description: 'A short-lived JWT to send as `Authorization: Bearer …`' })
  accessToken: string;
}

export class CurrentUserDto {
  @ApiProperty() id: string;
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: ['owner', 'estimator', 'crew_lead'] }) role: string;
  @ApiProperty() companyId: string;
  @ApiProperty() companyName: string;
}

export class InvitePreviewDto {
  @ApiProperty() email: string;
  @ApiProperty({ enum: ['owner', 'estimator', 'crew_lead'] }) role: string;
  @ApiProperty() companyName: string;
}
