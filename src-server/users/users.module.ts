import { Module } from '@nestjs/common';
import { UsersController } from './users.controller';
import { UsersService } from './users.service';
import { UserTokensService } from './user-tokens.service';

@Module({ controllers: [UsersController], providers: [UsersService, UserTokensService], exports: [UsersService, UserTokensService] })
export class UsersModule {}
