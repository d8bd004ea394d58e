export {loadPlan, type PlanOverrides} from './load.js';
export {defaultConfig} from './defaults.js';
export {slugify} from './slug.js';
export type * from './plan.js';
export {salvagePlan} from './salvage.js';
export {portablePlan} from './portable.js';
export {packJsonSchema, PACK_SCHEMA_FILE} from './jsonSchema.js';
