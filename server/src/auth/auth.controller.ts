import { Body, Controller, Get, HttpCode, Param, Post, Req, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { CurrentUser as CurrentUserShape, InvitePreview } from '@pondwright/shared';
import type { Request, Response } from 'express';
import { AppConfig } from '../config/app-config';
import { AnyRole, CurrentUser, Public, type Principal } from '../common/decorators/auth.decorators';
import { InvitesService } from '../invites/invites.service';
import { AuthService, type Session } from './auth.service';
import {
  AcceptInviteDto,
  AccessTokenDto,
  CurrentUserDto,
  InvitePreviewDto,
  LoginDto,
  SignupDto,
} from './dto/auth.dto';
import { clearRefreshCookie, readRefreshCookie, setRefreshCookie } from './refresh-cookie';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly invites: InvitesService,
    private readonly config: AppConfig,
  ) {}

  @Public()
  @Post('signup')
  @ApiCreatedResponse({
    type: AccessTokenDto,
    description: 'Company and owner created; refresh cookie set',
  })
  async signup(
    @Body() body: SignupDto,
    @Res({ passthrough: true }) response: Response,
  ): Promise<AccessTokenDto> {
    return this.respond(response, await this.auth.signup(body));
  }

  @Public()
  @Post('login')
  @HttpCode(200)
  @ApiOkResponse({ type: AccessTokenDto })
  async login(
    @Body() body: LoginDto,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<AccessTokenDto> {
    return this.respond(response, await this.auth.login(body, request.ip ?? 'unknown'));
  }

  @Public()
  @Post('refresh')
  @HttpCode(200)
  @ApiOkResponse({
    type: AccessTokenDto,
    description: 'Uses the refresh cookie once and sets its successor',
  })
  async refresh(
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<AccessTokenDto> {
    try {
      return this.respond(response, await this.auth.refresh(readRefreshCookie(request)));
    } catch (error) {
      clearRefreshCookie(response, this.config.isProduction);
      throw error;
    }
  }

  @Public()
  @Post('logout')
  @HttpCode(204)
  async logout(
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<void> {
    await this.auth.logout(readRefreshCookie(request));
    clearRefreshCookie(response, this.config.isProduction);
  }

  @AnyRole()
  @Get('me')
  @ApiBearerAuth()
  @ApiOkResponse({ type: CurrentUserDto })
  me(@CurrentUser() principal: Principal): Promise<CurrentUserShape> {
    return this.auth.me(principal.userId);
  }

  @Public()
  @Get('invites/:token')
  @ApiOkResponse({
    type: InvitePreviewDto,
    description: '404 unknown token, 410 expired, used or revoked',
  })
  previewInvite(@Param('token') token: string): Promise<InvitePreview> {
    return this.invites.preview(token);
  }

  @Public()
  @Post('accept-invite')
  @ApiCreatedResponse({ type: AccessTokenDto })
  async acceptInvite(
    @Body() body: AcceptInviteDto,
    @Res({ passthrough: true }) response: Response,
  ): Promise<AccessTokenDto> {
    return this.respond(response, await this.auth.acceptInvite(body));
  }

  private respond(response: Response, session: Session): AccessTokenDto {
    setRefreshCookie(
      response,
      session.refresh.token,
      session.refresh.expiresAt,
      this.config.isProduction,
    );
    return { accessToken: session.accessToken };
  }
}
