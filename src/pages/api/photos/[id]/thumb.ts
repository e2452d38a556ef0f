// A fitting photo's thumbnail (WebP), or a placeholder tile when none could be made (HEIC).
import type { APIRoute } from 'astro';
import { servePhoto } from '@/services/serve-photo';

export const prerender = false;

/** The small copy, to members of the photo's shop only. */
export const GET: APIRoute = ({ locals, params }) => servePhoto(locals, params.id ?? '', 'thumb');
