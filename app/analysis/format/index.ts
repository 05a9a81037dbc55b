// The engine's input format: the layout document, car profiles and class presets.
export * from "./layout-document";
export * from "./field-limits";
export { crossFieldIssues, takeoffIssues } from "./layout-document-checks";
export * from "./car-schema";
export * from "./car-fields";
export * from "./cars";
export * from "./starter-layout";
export * from "./jump-presets";
