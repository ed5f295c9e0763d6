import { Body, Controller, Get, Param, Patch, Post } from '@nestjs/common';
import type { User } from '@lockstep/shared';
import { ApiOperation } from '@nestjs/swagger';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ApiErrors } from '../common/openapi/api-errors.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { CreateUserDto } from './dto/create-user.dto.js';
import { UpdateUserDto } from './dto/update-user.dto.js';
import { UsersService } from './users.service.js';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';

@Controller('users')
@Roles('admin')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @ApiOperation({ summary: 'Every user' })
  @Get()
  list(): Promise<User[]> {
    return this.users.list();
  }

  @ApiOperation({ summary: 'Create a user' })
  @ApiErrors(409)
  @Post()
  create(@Body() body: CreateUserDto, @CurrentUser() admin: AuthUser): Promise<User> {
    return this.users.create(body, admin);
  }

  @ApiOperation({ summary: 'Change a user’s name, role, wards or password, or deactivate them' })
  @ApiErrors(404)
  @Patch(':id')
  update(@Param('id', ParseIdPipe) id: number, @Body() body: UpdateUserDto, @CurrentUser() admin: AuthUser): Promise<User> {
    return this.users.update(id, body, admin);
  }
}
