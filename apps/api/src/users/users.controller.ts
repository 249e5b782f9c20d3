import type { AcceptedResponse, Page, UserView } from '@catline/contracts';
import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  ParseIntPipe,
  Patch,
  Post,
  Query,
} from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { CreateUserDto } from './dto/create-user.dto.js';
import { UpdateUserDto } from './dto/update-user.dto.js';
import { UsersService } from './users.service.js';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { Created } from '../common/openapi/created.decorator.js';
import { AcceptedResponseDto } from '../common/openapi/views/auth.view.js';
import { UserPageDto, UserViewDto } from '../common/openapi/views/fleet.view.js';
import { RecordsPageQueryDto } from '../common/paging/page-query.dto.js';

@ApiTags('users')
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @ApiDoc('List the people, a page at a time', { response: UserPageDto })
  @Roles('admin')
  @Get()
  list(@CurrentUser() caller: AuthenticatedUser, @Query() query: RecordsPageQueryDto): Promise<Page<UserView>> {
    return this.users.list(caller, query);
  }

  @ApiDoc('List the pilots, a page at a time', {
    response: UserPageDto,
    description: 'The active pilots, to assign to sorties.',
  })
  @Roles('admin', 'air_operations', 'handler')
  @Get('pilots')
  listPilots(@CurrentUser() caller: AuthenticatedUser, @Query() query: RecordsPageQueryDto): Promise<Page<UserView>> {
    return this.users.listPilots(caller, query);
  }

  @ApiDoc('Read one person', { response: UserViewDto, refuses: { 404: ['user_not_found'] } })
  @Roles('admin')
  @Get(':id')
  get(@CurrentUser() caller: AuthenticatedUser, @Param('id', ParseIntPipe) id: number): Promise<UserView> {
    return this.users.get(caller, id);
  }

  @ApiDoc('Add a person', {
    response: UserViewDto,
    description: 'Without a password the person is mailed an invitation link.',
    refuses: {
      400: ['invalid_binding', 'unknown_reference', 'ship_required', 'weak_password'],
      404: ['ship_not_found'],
      409: ['email_taken'],
    },
  })
  @Roles('admin')
  @Post()
  @Created((created: UserView) => `/api/users/${created.id}`)
  create(@CurrentUser() actor: AuthenticatedUser, @Body() body: CreateUserDto): Promise<UserView> {
    return this.users.create(actor, body);
  }

  @ApiDoc('Change a person', {
    response: UserViewDto,
    refuses: { 400: ['invalid_binding', 'unknown_reference'], 404: ['user_not_found'], 409: ['self_change'] },
  })
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
  @ApiDoc('Send a person a new invitation', {
    response: AcceptedResponseDto,
    refuses: { 404: ['user_not_found'], 409: ['cannot_invite'] },
  })
  @Roles('admin')
  @Post(':id/invitation')
  @HttpCode(HttpStatus.ACCEPTED)
  async invite(
    @CurrentUser() caller: AuthenticatedUser,
    @Param('id', ParseIntPipe) id: number,
  ): Promise<AcceptedResponse> {
    const email = await this.users.resendInvitation(caller, id);
    return { message: `A new invitation link is on its way to ${email}; earlier links no longer work.` };
  }

  @ApiDoc('Remove a person', { refuses: { 404: ['user_not_found'], 409: ['self_change'] } })
  @Roles('admin')
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@Param('id', ParseIntPipe) id: number, @CurrentUser() actor: AuthenticatedUser): Promise<void> {
    return this.users.remove(id, actor);
  }
}
