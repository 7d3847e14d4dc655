import { Module } from '@nestjs/common';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AppConfig } from '../config/app-config';
import { InvitesModule } from '../invites/invites.module';
import { User } from '../users/entities/user.entity';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { LoginFailure } from './entities/login-failure.entity';
import { RefreshToken } from './entities/refresh-token.entity';
import { JwtStrategy } from './jwt.strategy';
import { LoginThrottleService } from './login-throttle.service';
import { SessionsModule } from './sessions.module';
import { JWT_ALGORITHM } from './access-tokens';

@Module({
  imports: [
    PassportModule,
    JwtModule.registerAsync({
      inject: [AppConfig],
      useFactory: (config: AppConfig) => ({
        secret: config.jwt.secret,
        signOptions: { algorithm: JWT_ALGORITHM, expiresIn: config.jwt.accessTtlSeconds },
        verifyOptions: { algorithms: [JWT_ALGORITHM] },
      }),
    }),
    TypeOrmModule.forFeature([User, RefreshToken, LoginFailure]),
    InvitesModule,
    SessionsModule,
  ],
  controllers: [AuthController],
  providers: [AuthService, JwtStrategy, LoginThrottleService],
})
export class AuthModule {}
