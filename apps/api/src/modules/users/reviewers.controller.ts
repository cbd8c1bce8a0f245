import { Controller, Get } from '@nestjs/common';
import { reviewerListSchema, type ReviewerList } from '@limitbook/contracts';
import { Roles } from '../../common/auth/access.decorators.js';
import { ApiContract } from '../../common/openapi/api-contract.decorator.js';
import { UsersRepository } from './users.repository.js';

/** Lets authors pick reviewers without the admin-only user list. */
@Controller('reviewers')
@Roles('author', 'admin')
export class ReviewersController {
  constructor(private readonly users: UsersRepository) {}

  @Get()
  @ApiContract({ summary: 'List the active users who can be asked to review (role reviewer or admin)', response: reviewerListSchema, tag: 'Users' })
  async list(): Promise<ReviewerList> {
    const rows = await this.users.listActiveReviewers();
    return {
      items: rows.flatMap((row) => (row.role === 'reviewer' || row.role === 'admin' ? [{ id: row.id, name: row.name, email: row.email, role: row.role }] : [])),
    };
  }
}
