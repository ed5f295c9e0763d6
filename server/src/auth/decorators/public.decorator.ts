import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC_KEY = 'isPublic';

/** Opens a route to callers without a token (sign-in, health). */
export const Public = () => SetMetadata(IS_PUBLIC_KEY, true);
