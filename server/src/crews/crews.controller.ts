import { Body, Controller, Get, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { createCrewRequestSchema, type CrewView } from '@pondwright/shared';
import { ApiJsonResponse, ApiZodBody } from '../common/decorators/api-docs.decorators';
import { AnyRole, Roles } from '../common/decorators/auth.decorators';
import { CrewsService } from './crews.service';

@ApiTags('jobs')
@ApiBearerAuth()
@Controller('crews')
export class CrewsController {
  constructor(private readonly crews: CrewsService) {}

  @AnyRole()
  @Get()
  @ApiJsonResponse(200, 'CrewView[]', 'The company’s crews')
  list(): Promise<CrewView[]> {
    return this.crews.list();
  }

  @Roles('owner')
  @Post()
  @ApiZodBody(createCrewRequestSchema)
  @ApiJsonResponse(201, 'CrewView', 'The new crew')
  create(@Body() body: unknown): Promise<CrewView> {
    return this.crews.create(body);
  }
}
