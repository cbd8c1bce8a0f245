import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module.js';
import { AuthModule } from '../auth/auth.module.js';
import { ReviewersController } from './reviewers.controller.js';
import { UsersController } from './users.controller.js';
import { UsersRepository } from './users.repository.js';
import { BootstrapAdminSeed, DemoPeopleSeed } from './users.seed.js';
import { UsersService } from './users.service.js';

@Module({
  imports: [AuthModule, AuditModule],
  controllers: [UsersController, ReviewersController],
  providers: [UsersService, UsersRepository, BootstrapAdminSeed, DemoPeopleSeed],
})
export class UsersModule {}
