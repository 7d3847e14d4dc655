import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiBody,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { takeoffInputSchema, takeoffSchema, type Takeoff } from '@pondwright/shared/engine';
import { z } from 'zod';
import { Roles } from '../common/decorators/auth.decorators';
import { TakeoffService } from './takeoff.service';

// The OpenAPI schemas come from the same zod schemas the engine validates with.
const inputJsonSchema = z.toJSONSchema(takeoffInputSchema, { io: 'input', unrepresentable: 'any' });
const outputJsonSchema = z.toJSONSchema(takeoffSchema, { unrepresentable: 'any' });

@ApiTags('takeoff')
@ApiBearerAuth()
@Controller('takeoff')
export class TakeoffController {
  constructor(private readonly takeoff: TakeoffService) {}

  /**
   * The body is validated by the engine's own zod schema (not a DTO class), so the global ValidationPipe
   * leaves it alone and every problem comes back as a field message with its dotted path.
   */
  @Roles('owner', 'estimator')
  @Post()
  @HttpCode(200)
  @ApiBody({ schema: inputJsonSchema as object })
  @ApiOkResponse({
    schema: outputJsonSchema as object,
    description: 'Quantities with an explanation of each',
  })
  @ApiBadRequestResponse({
    description: 'One message per invalid field, e.g. `basins.0.maxDepthFt`',
  })
  compute(@Body() body: unknown): Takeoff {
    return this.takeoff.compute(body);
  }
}
