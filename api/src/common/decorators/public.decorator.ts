import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC_KEY = 'swapwright:isPublic';

/** The route needs no sign-in (the JWT guard is global). */
export const Public = () => SetMetadata(IS_PUBLIC_KEY, true);
