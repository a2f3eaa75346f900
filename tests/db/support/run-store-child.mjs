// Runs store-child.ts in THIS process (tsx's in-process loader API), so killing this process kills
// the connection that is storing the upload.
import { register } from 'tsx/esm/api';

register();
await import('./store-child.ts');
