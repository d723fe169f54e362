// A render worker thread (piscina): TypeScript through tsx, as the server itself runs. The PDF,
// SVG and font modules load here, not in the server's own thread.
import { register } from 'tsx/esm/api';

register();
const { runRenderTask } = await import('./render-tasks.ts');

export default runRenderTask;
