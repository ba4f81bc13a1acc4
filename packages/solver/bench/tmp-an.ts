import { analyze, beamModelSchema } from "../src/index.js";
import { interactiveModel } from "./models.js";
const model = beamModelSchema.parse(interactiveModel());
for (let i = 0; i < 10000; i++) analyze(model);
