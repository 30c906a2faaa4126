import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC_KEY = 'linesmith:isPublic';

/** Opts a handler or controller out of the global sign-in requirement. */
export const Public = () => SetMetadata(IS_PUBLIC_KEY, true);
