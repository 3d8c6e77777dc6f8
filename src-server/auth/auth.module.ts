import { Module } from '@nestjs/common';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { TypeOrmModule } from '@nestjs/typeorm';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { User } from '../users/user.entity';
import { UsersModule } from '../users/users.module';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { LoginAttemptsService } from './login-attempts.service';
import { JwtStrategy } from './jwt.strategy';

@Module({
  imports: [
    PassportModule,
    TypeOrmModule.forFeature([User]),
    UsersModule,
    JwtModule.registerAsync({ inject: [APP_CONFIG], useFactory: (config: AppConfig) => ({ secret: config.jwt.secret }) }),
  ],
  controllers: [AuthController],
  providers: [AuthService, LoginAttemptsService, JwtStrategy],
  exports: [AuthService],
})
export class AuthModule {}
