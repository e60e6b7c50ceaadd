export { MANUFACTURERS, MANUFACTURER_NAMES, type DemoManufacturer, type DemoManufacturerName } from './manufacturers';
export { DEMO_PARTS, DEMO_SEARCH_EXAMPLES } from './parts';
export { SCENARIO, SCENARIO_NAME } from './scenario';
export { DEMO_EQUIVALENTS, type DemoEquivalent } from './equivalents';
