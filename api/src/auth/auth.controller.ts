import { Body, Controller, Get, HttpCode, Post, UseGuards } from '@nestjs/common';
import { ApiBearerAuth, ApiNoContentResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Public } from '../common/decorators/public.decorator.js';
import type { AuthUser } from '../common/roles.js';
import { AuthService } from './auth.service.js';
import { LoginDto } from './dto/login.dto.js';
import { RefreshDto } from './dto/refresh.dto.js';
import { SignInThrottleGuard } from './sign-in-throttle.js';
import { SessionResponse, UserProfileResponse } from './dto/session-response.dto.js';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  @Public()
  @UseGuards(SignInThrottleGuard)
  @Post('login')
  @HttpCode(200)
  @ApiOkResponse({ type: SessionResponse })
  login(@Body() dto: LoginDto) {
    return this.auth.signIn(dto.email, dto.password);
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
