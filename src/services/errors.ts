// The errors services throw. The class lives in src/lib/service-error.ts (lib/api.ts answers it,
// and lib never imports services); services keep importing it from here.
export { ServiceError } from '@/lib/service-error';
