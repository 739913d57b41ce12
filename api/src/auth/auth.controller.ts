import { Body, Controller, Get, HttpCode, Post, Req, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiNoContentResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Public } from '../common/decorators/public.decorator.js';
import type { AuthUser } from '../common/roles.js';
import { AuthService, type Session } from './auth.service.js';
import { DEVICE_COOKIE, DeviceCookies } from './device-cookie.js';
import { LoginDto } from './dto/login.dto.js';
import { RefreshDto } from './dto/refresh.dto.js';
import { SessionResponse, UserProfileResponse } from './dto/session-response.dto.js';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly devices: DeviceCookies,
  ) {}

  /** Limited per account and per address (429 with Retry-After); sets the device cookie. */
  @Public()
  @Post('login')
  @HttpCode(200)
  @ApiOkResponse({ type: SessionResponse })
  async login(@Body() dto: LoginDto, @Req() req: Request, @Res({ passthrough: true }) res: Response): Promise<Session> {
    const client = { address: req.ip ?? req.socket.remoteAddress ?? 'unknown', cookieHeader: req.headers.cookie };
    const { session, deviceCookie } = await this.auth.signIn(dto.email, dto.password, client);
    res.cookie(DEVICE_COOKIE, deviceCookie, this.devices.options(req.secure));
    return session;
  }

  @Public()
  @Post('refresh')
  @HttpCode(200)
  @ApiOkResponse({ type: SessionResponse })
  refresh(@Body() dto: RefreshDto) {
    return this.auth.refresh(dto.refreshToken);
  }

  /** Ends the sign-in the refresh token belongs to; works with an expired access token. */
  @Public()
  @Post('logout')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Signed out' })
  async logout(@Body() dto: RefreshDto): Promise<void> {
    await this.auth.signOut(dto.refreshToken);
  }

  @ApiBearerAuth()
  @Get('me')
  @ApiOkResponse({ type: UserProfileResponse })
  me(@CurrentUser() user: AuthUser) {
    return this.auth.profile(user.id);
  }
}
