import { Injectable, type ArgumentMetadata, type PipeTransform } from '@nestjs/common';
import { EQUIANALGESIC_ROUTES, type EquianalgesicRoute } from '@lockstep/shared';
import { fieldError } from '../common/errors/field-error.js';

/** The route of a row of the equianalgesic table; anything else is a 400 naming the parameter. */
@Injectable()
export class ParseEquianalgesicRoutePipe implements PipeTransform<string, EquianalgesicRoute> {
  transform(value: string, metadata: ArgumentMetadata): EquianalgesicRoute {
    if (!(EQUIANALGESIC_ROUTES as readonly string[]).includes(value)) {
      throw fieldError(metadata.data ?? 'route', `route must be ${EQUIANALGESIC_ROUTES.join(' or ')}`);
    }
    return value as EquianalgesicRoute;
  }
}
