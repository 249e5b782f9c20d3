import type { AcceptedResponse, UserView } from '@catline/contracts';
import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { CreateUserDto } from './dto/create-user.dto.js';
import { UpdateUserDto } from './dto/update-user.dto.js';
import { UsersService } from './users.service.js';

@ApiTags('users')
@ApiBearerAuth()
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Roles('admin')
  @Get()
  list(): Promise<UserView[]> {
    return this.users.list();
  }

  @Roles('admin', 'air_operations', 'handler')
  @Get('pilots')
  listPilots(): Promise<UserView[]> {
    return this.users.listPilots();
  }

  @Roles('admin')
  @Post()
  create(@Body() body: CreateUserDto): Promise<UserView> {
    return this.users.create(body);
  }

  @Roles('admin')
  @Patch(':id')
  update(
    @Param('id', ParseIntPipe) id: number,
    @Body() body: UpdateUserDto,
    @CurrentUser() actor: AuthenticatedUser,
  ): Promise<UserView> {
    return this.users.update(id, body, actor);
  }

  /** Mails a new invitation link to a person who has not chosen a password yet. */
  @Roles('admin')
  @Post(':id/invitation')
  @HttpCode(HttpStatus.ACCEPTED)
  async invite(@Param('id', ParseIntPipe) id: number): Promise<AcceptedResponse> {
    const email = await this.users.resendInvitation(id);
    return { message: `A new invitation link is on its way to ${email}; earlier links no longer work.` };
  }

  @Roles('admin')
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@Param('id', ParseIntPipe) id: number, @CurrentUser() actor: AuthenticatedUser): Promise<void> {
    return this.users.remove(id, actor);
  }
}
