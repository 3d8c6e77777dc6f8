import { Module } from '@nestjs/common';
import { UsersController } from './users.controller';
import { UsersService } from './users.service';
import { UserTokensService } from './user-tokens.service';
import { DemoAccountsCheck } from './demo-accounts.check';

@Module({ controllers: [UsersController], providers: [UsersService, UserTokensService, DemoAccountsCheck], exports: [UsersService, UserTokensService] })
export class UsersModule {}
