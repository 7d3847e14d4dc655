import { Module } from '@nestjs/common';
import { RefreshTokensService } from './refresh-tokens.service';

/** Refresh-token families, shared by sign-in and by the team screens that end a member's sessions. */
@Module({
  providers: [RefreshTokensService],
  exports: [RefreshTokensService],
})
export class SessionsModule {}
