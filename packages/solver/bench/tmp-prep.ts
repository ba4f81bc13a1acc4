import { analyze, beamModelSchema } from "../src/index.js";
import { prepareEnvelopeExtremes } from "../src/envelopeExtremes.js";
import { curveRanges } from "../src/curveRanges.js";
import { interactiveModel } from "./models.js";
const analysis = analyze(beamModelSchema.parse(interactiveModel()));
const cr = analysis.cases.map((c) => curveRanges(analysis.grid, c.curve));
for (let i = 0; i < 8000; i++) prepareEnvelopeExtremes(analysis, cr);
