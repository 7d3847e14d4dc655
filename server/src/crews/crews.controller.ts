import { Body, Controller, Get, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { CrewView } from '@pondwright/shared';
import { AnyRole, Roles } from '../common/decorators/auth.decorators';
import { CrewsService } from './crews.service';

@ApiTags('jobs')
@ApiBearerAuth()
@Controller('crews')
export class CrewsController {
  constructor(private readonly crews: CrewsService) {}

  @AnyRole()
  @Get()
  list(): Promise<CrewView[]> {
    return this.crews.list();
  }

  /** Body: `createCrewRequestSchema`. */
  @Roles('owner')
  @Post()
  create(@Body() body: unknown): Promise<CrewView> {
    return this.crews.create(body);
  }
}
