// The curve viewer's page (src/ui/viewer/index.html): a curve typed into a box, drawn by the tracer
// through the Pixi canvas sink. `?curve=EQUATION` in the address opens another curve.
import { CurveViewer, DEFAULT_EQUATION } from './curve-viewer.ts';

const viewer = new CurveViewer(document.body);
void viewer.start(new URLSearchParams(location.search).get('curve') ?? DEFAULT_EQUATION);
