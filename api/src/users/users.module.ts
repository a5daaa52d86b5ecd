import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module';
import { MeController } from './me.controller';
import { PasswordService } from './password.service';
import { User } from './user.entity';
import { UsersController } from './users.controller';
import { UsersService } from './users.service';

/** Users and their passwords. */
@Module({
  imports: [TypeOrmModule.forFeature([User]), AuditModule],
  controllers: [UsersController, MeController],
  providers: [UsersService, PasswordService],
  exports: [UsersService, PasswordService],
})
export class UsersModule {}
