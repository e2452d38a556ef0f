// The errors services throw. The class lives in src/lib/server/service-error.ts (lib/server/api.ts answers it,
// and lib never imports services); services keep importing it from here.
export { ServiceError } from '@/lib/server/service-error';
