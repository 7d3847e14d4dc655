import { BadRequestException, Injectable } from '@nestjs/common';
import { computeTakeoff, defaultEngineParameters, type Takeoff } from '@pondwright/shared/engine';
import { insetPolygon } from '@pondwright/shared/engine/polygon-inset';

/**
 * The server's run of the shared takeoff engine: the same code the client previews with, as the
 * authority, always with the general polygon offset so every outline can be measured.
 */
@Injectable()
export class TakeoffService {
  compute(input: unknown): Takeoff {
    const result = computeTakeoff(input, defaultEngineParameters, { insetPolygon });
    if (!result.ok) {
      const message =
        result.errors.length === 1 ? result.errors[0]!.message : 'Some fields need attention';
      throw new BadRequestException({ message, details: result.errors });
    }
    return result.takeoff;
  }
}
