import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC_KEY = 'siteband:isPublic';

/** Opens a route to callers without an access token; every other route needs one (deny by default). */
export const Public = (): MethodDecorator & ClassDecorator => SetMetadata(IS_PUBLIC_KEY, true);
