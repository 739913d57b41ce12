import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC = 'plumbline:public';
/** Marks a route that needs no signed-in user (sign-in, refresh, health). */
export const Public = () => SetMetadata(IS_PUBLIC, true);
