// The bench templates page: one module per tool under templates/ — fret slotting (frets.js),
// saddle compensation (compensation.js), the gauge picker (gauges.js) and the bore panel with its
// drilling template and tone-hole solver (solver.js). Each wires its own form when imported.
import './templates/frets.js';
import './templates/compensation.js';
import './templates/gauges.js';
import './templates/solver.js';
