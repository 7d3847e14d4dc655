import { Body, Controller, Delete, Get, HttpCode, Param, Patch } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { TeamMember } from '@pondwright/shared';
import { Roles } from '../common/decorators/auth.decorators';
import { TeamMemberDto, UpdateUserDto } from './dto/update-user.dto';
import { UsersService } from './users.service';

@ApiTags('team')
@ApiBearerAuth()
@Roles('owner')
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  @ApiOkResponse({ type: [TeamMemberDto] })
  list(): Promise<TeamMember[]> {
    return this.users.list();
  }

  @Get(':id')
  @ApiOkResponse({ type: TeamMemberDto })
  get(@Param('id') id: string): Promise<TeamMember> {
    return this.users.get(id);
  }

  @Patch(':id')
  @ApiOkResponse({ type: TeamMemberDto })
  update(@Param('id') id: string, @Body() body: UpdateUserDto): Promise<TeamMember> {
    return this.users.update(id, body);
  }

  /** Removes the member from the team: deactivated, never erased, so their past work keeps its author. */
  @Delete(':id')
  @HttpCode(204)
  async remove(@Param('id') id: string): Promise<void> {
    await this.users.update(id, { active: false });
  }
}
