import type { z } from 'zod';
import { basinProfile, type BasinProfile } from '../basin/basin-profile';
import { needsPolygonLibrary, planShape, type PolygonInset } from '../geometry/plan-shape';
import { engineParametersSchema, type EngineParameters } from '../parameters/parameters-schema';
import { defaultEngineParameters } from '../parameters/defaults';
import { takeoffInputSchema, type TakeoffInput } from '../schemas/takeoff-input';
import type { FieldError } from '../schemas/takeoff-output';
import { inchesToFeet } from '../units/units';

/**
 * Geometry the caller supplies: the general polygon offset for outlines that bend inward (the server
 * always passes it; a browser loads it on demand, see `@pondwright/shared/engine/polygon-inset`).
 */
export type EngineGeometry = { insetPolygon?: PolygonInset };

export type PreparedInput = {
  input: TakeoffInput;
  params: EngineParameters;
  profiles: BasinProfile[];
  method: 'hand' | 'machine';
};

/** Turns zod issues into one message per field, as dotted paths ("basins.0.shelves.1.depthIn"). */
export function toFieldErrors(issues: readonly z.core.$ZodIssue[], prefix = ''): FieldError[] {
  const seen = new Set<string>();
  const errors: FieldError[] = [];
  for (const issue of issues) {
    const path = issue.path.map(String).join('.');
    const field = prefix && path ? `${prefix}.${path}` : prefix || path || 'input';
    if (seen.has(field)) continue;
    seen.add(field);
    errors.push({ field, message: issue.message });
  }
  return errors;
}

function geometryErrors(
  input: TakeoffInput,
  params: EngineParameters,
  profiles: BasinProfile[],
): FieldError[] {
  const errors: FieldError[] = [];
  profiles.forEach((profile, i) => {
    const basin = input.basins[i]!;
    if (profile.collapse?.at === 'shelf') {
      const k = profile.collapse.shelfIndex;
      errors.push({
        field: `basins.${i}.shelves.${k}.widthIn`,
        message: `The shelves leave no room below this one: the basin is ${profile.widthFt.toFixed(2)} ft across at its narrowest. Make the shelves narrower or fewer.`,
      });
    } else if (profile.collapse?.at === 'floor') {
      errors.push({
        field: basin.wallStyle === 'battered' ? `basins.${i}.wallStyle` : `basins.${i}.maxDepthFt`,
        message:
          'The sloping walls and shelves meet before the floor: the basin has no floor at this depth. Make it shallower, or the walls vertical.',
      });
    }
    const depths = [0, ...basin.shelves.map((s) => inchesToFeet(s.depthIn)), basin.maxDepthFt];
    const floorStepFt = depths[depths.length - 1]! - depths[depths.length - 2]!;
    if (inchesToFeet(input.rock.floorGravelDepthIn) >= floorStepFt) {
      errors.push({
        field: 'rock.floorGravelDepthIn',
        message: `Gravel on the floor of basin ${i + 1} would fill its deepest step (${(floorStepFt * 12).toFixed(1)} in).`,
      });
    }
    basin.shelves.forEach((_, k) => {
      const stepFt = depths[k + 1]! - depths[k]!;
      if (inchesToFeet(input.rock.shelfGravelDepthIn) >= stepFt) {
        errors.push({
          field: 'rock.shelfGravelDepthIn',
          message: `Gravel on shelf ${k + 1} of basin ${i + 1} would fill the step above it (${(stepFt * 12).toFixed(1)} in).`,
        });
      }
    });
  });
  const vehicle = params.excavation.haulVehicles.find((v) => v.id === input.site.haulVehicleId);
  if (!vehicle) {
    errors.push({
      field: 'site.haulVehicleId',
      message: `Not in the vehicle list; choose one of: ${params.excavation.haulVehicles.map((v) => v.id).join(', ')}.`,
    });
  }
  if (
    input.site.excavationMethod === 'machine' &&
    input.site.accessWidthIn < params.excavation.machineMinAccessWidthIn
  ) {
    errors.push({
      field: 'site.excavationMethod',
      message: `The access (${input.site.accessWidthIn} in) is narrower than a machine needs (${params.excavation.machineMinAccessWidthIn} in).`,
    });
  }
  input.lighting.forEach((run, i) => {
    if (params.lighting.conductorOhmsPer1000Ft[run.gaugeAwg] === undefined) {
      errors.push({
        field: `lighting.${i}.gaugeAwg`,
        message: 'No conductor resistance for this gauge in the price book.',
      });
    }
  });
  return dedupe(errors);
}

function dedupe(errors: FieldError[]): FieldError[] {
  const seen = new Set<string>();
  return errors.filter((e) => (seen.has(e.field) ? false : (seen.add(e.field), true)));
}

/**
 * Validates the parameters (unless they are the defaults), the input's shape and ranges, and what only
 * the geometry or the catalogues can tell (shelves that leave no floor, gravel deeper than a step,
 * unknown vehicle). Returns every problem as a field message, or the prepared input.
 */
export function validateInput(
  raw: unknown,
  rawParams: EngineParameters,
  geometry: EngineGeometry = {},
): { ok: true; prepared: PreparedInput } | { ok: false; errors: FieldError[] } {
  let params = rawParams;
  if (rawParams !== defaultEngineParameters) {
    const parsedParams = engineParametersSchema.safeParse(rawParams);
    if (!parsedParams.success)
      return { ok: false, errors: toFieldErrors(parsedParams.error.issues, 'parameters') };
    params = parsedParams.data;
  }
  const parsed = takeoffInputSchema.safeParse(raw);
  if (!parsed.success) return { ok: false, errors: toFieldErrors(parsed.error.issues) };
  const input = parsed.data;
  const unmeasurable = geometry.insetPolygon
    ? []
    : input.basins.flatMap((basin, index) =>
        needsPolygonLibrary(basin.outline)
          ? [
              {
                field: `basins.${index}.outline`,
                message:
                  'This outline bends inward: its shelves need the polygon-offset module, which is not loaded yet',
              },
            ]
          : [],
      );
  if (unmeasurable.length > 0) return { ok: false, errors: unmeasurable };
  const profiles = input.basins.map((basin) =>
    basinProfile(
      basin,
      planShape(basin.outline, params.geometry.ovalPolygonSegments, geometry.insetPolygon),
      params.geometry.batterRunPerRise,
    ),
  );
  const errors = geometryErrors(input, params, profiles);
  if (errors.length > 0) return { ok: false, errors };
  const method =
    input.site.excavationMethod === 'auto'
      ? input.site.accessWidthIn >= params.excavation.machineMinAccessWidthIn
        ? 'machine'
        : 'hand'
      : input.site.excavationMethod;
  return { ok: true, prepared: { input, params, profiles, method } };
}
