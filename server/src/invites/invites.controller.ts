import { Body, Controller, Delete, Get, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { CreatedInvite, PendingInvite } from '@pondwright/shared';
import { CurrentUser, Roles, type Principal } from '../common/decorators/auth.decorators';
import { CreateInviteDto, CreatedInviteDto, PendingInviteDto } from './dto/create-invite.dto';
import { InvitesService } from './invites.service';

@ApiTags('team')
@ApiBearerAuth()
@Roles('owner')
@Controller('invites')
export class InvitesController {
  constructor(private readonly invites: InvitesService) {}

  @Get()
  @ApiOkResponse({ type: [PendingInviteDto] })
  list(): Promise<PendingInvite[]> {
    return this.invites.listPending();
  }

  @Post()
  @ApiCreatedResponse({ type: CreatedInviteDto })
  create(@Body() body: CreateInviteDto, @CurrentUser() owner: Principal): Promise<CreatedInvite> {
    return this.invites.create(body, owner.userId);
  }

  @Delete(':id')
  @HttpCode(204)
  revoke(@Param('id') id: string): Promise<void> {
    return this.invites.revoke(id);
  }
}
