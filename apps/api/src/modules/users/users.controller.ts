import { Controller, Get, Patch, Post } from '@nestjs/common';
import {
  idParamSchema,
  inviteUserRequestSchema,
  pageQuerySchema,
  updateUserRequestSchema,
  userListSchema,
  userSchema,
  type InviteUserRequest,
  type PageQuery,
  type UpdateUserRequest,
} from '@limitbook/contracts';
import { CurrentUser, Roles } from '../../common/auth/access.decorators.js';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { ApiContract } from '../../common/openapi/api-contract.decorator.js';
import { ValidBody, ValidParams, ValidQuery } from '../../common/validation/valid.decorators.js';
import { UsersService } from './users.service.js';

@Controller('users')
@Roles('admin')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  @ApiContract({ summary: 'List users', response: userListSchema, tag: 'Users' })
  list(@ValidQuery(pageQuerySchema) query: PageQuery) {
    return this.users.list(query);
  }

  @Post('invitations')
  @ApiContract({ summary: 'Invite a user by e-mail; the mailed link lets them set a password', response: userSchema, tag: 'Users' })
  invite(@CurrentUser() actor: AuthUser, @ValidBody(inviteUserRequestSchema) body: InviteUserRequest) {
    return this.users.invite(actor, body);
  }

  @Patch(':id')
  @ApiContract({ summary: "Change a user's role, name or active state", response: userSchema, tag: 'Users' })
  update(@CurrentUser() actor: AuthUser, @ValidParams(idParamSchema) params: { id: string }, @ValidBody(updateUserRequestSchema) body: UpdateUserRequest) {
    return this.users.update(actor, params.id, body);
  }
}
