import { Controller, Get, HttpCode, Inject, Post, Req, Res, UseGuards } from '@nestjs/common';
import {
  acceptInviteRequestSchema,
  forgotPasswordRequestSchema,
  resetPasswordRequestSchema,
  sessionUserSchema,
  signInRequestSchema,
  signInResponseSchema,
  type AcceptInviteRequest,
  type ForgotPasswordRequest,
  type ResetPasswordRequest,
  type SignInRequest,
} from '@limitbook/contracts';
import { type Request, type Response } from 'express';
import { AnySignedIn, CurrentUser, Public, Roles } from '../../common/auth/access.decorators.js';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { ApiContract } from '../../common/openapi/api-contract.decorator.js';
import { ValidBody } from '../../common/validation/valid.decorators.js';
import { APP_CONFIG, type ResolvedConfig } from '../../config/config.module.js';
import { AuthRateLimitGuard } from './auth-rate-limit.guard.js';
import { AuthService, type IssuedSession } from './auth.service.js';

export const REFRESH_COOKIE = 'limitbook_refresh';
const REFRESH_COOKIE_PATH = '/api/auth';

@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    @Inject(APP_CONFIG) private readonly config: ResolvedConfig,
  ) {}

  @Post('sign-in')
  @HttpCode(200)
  @Public()
  @UseGuards(AuthRateLimitGuard)
  @ApiContract({ summary: 'Sign in with e-mail and password; also sets the refresh cookie', response: signInResponseSchema, tag: 'Auth' })
  async signIn(@ValidBody(signInRequestSchema) body: SignInRequest, @Res({ passthrough: true }) res: Response) {
    return this.withCookie(res, await this.auth.signIn(body));
  }

  @Post('refresh')
  @HttpCode(200)
  @Public()
  @ApiContract({ summary: 'Trade the refresh cookie for a new access token; the cookie rotates', response: signInResponseSchema, tag: 'Auth' })
  async refresh(@Req() req: Request, @Res({ passthrough: true }) res: Response) {
    try {
      return this.withCookie(res, await this.auth.refresh(this.cookieOf(req)));
    } catch (error) {
      this.clearCookie(res);
      throw error;
    }
  }

  @Post('sign-out')
  @HttpCode(204)
  @Public()
  @ApiContract({ summary: 'End the session held by the refresh cookie', tag: 'Auth' })
  async signOut(@Req() req: Request, @Res({ passthrough: true }) res: Response) {
    await this.auth.signOut(this.cookieOf(req));
    this.clearCookie(res);
  }

  @Get('me')
  @Roles(...AnySignedIn)
  @ApiContract({ summary: 'The signed-in user', response: sessionUserSchema, tag: 'Auth' })
  me(@CurrentUser() user: AuthUser) {
    return user;
  }

  @Post('forgot-password')
  @HttpCode(204)
  @Public()
  @UseGuards(AuthRateLimitGuard)
  @ApiContract({ summary: 'Mail a password reset link if the address belongs to an active account; answers the same either way', tag: 'Auth' })
  async forgotPassword(@ValidBody(forgotPasswordRequestSchema) body: ForgotPasswordRequest) {
    await this.auth.forgotPassword(body.email);
  }

  @Post('reset-password')
  @HttpCode(204)
  @Public()
  @ApiContract({ summary: 'Set a new password with the token from a reset link', tag: 'Auth' })
  async resetPassword(@ValidBody(resetPasswordRequestSchema) body: ResetPasswordRequest) {
    await this.auth.resetPassword(body);
  }

  @Post('accept-invite')
  @HttpCode(204)
  @Public()
  @ApiContract({ summary: 'Activate an invited account with the token from the invitation link', tag: 'Auth' })
  async acceptInvite(@ValidBody(acceptInviteRequestSchema) body: AcceptInviteRequest) {
    await this.auth.acceptInvite(body);
  }

  private cookieOf(req: Request): string | undefined {
    const value = (req.cookies as Record<string, unknown> | undefined)?.[REFRESH_COOKIE];
    return typeof value === 'string' && value.length > 0 ? value : undefined;
  }

  private withCookie(res: Response, session: IssuedSession) {
    res.cookie(REFRESH_COOKIE, session.refreshToken, {
      httpOnly: true,
      sameSite: 'strict',
      secure: this.config.publicUrl.startsWith('https://'),
      path: REFRESH_COOKIE_PATH,
      expires: session.refreshExpiresAt,
    });
    return session.response;
  }

  private clearCookie(res: Response): void {
    res.clearCookie(REFRESH_COOKIE, { httpOnly: true, sameSite: 'strict', secure: this.config.publicUrl.startsWith('https://'), path: REFRESH_COOKIE_PATH });
  }
}
