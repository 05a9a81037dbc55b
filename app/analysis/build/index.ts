// The build pack: datum stakes, stake positions for marking out, earth volumes of the jumps.
export * from "./datum";
export * from "./jump-stakes";
export * from "./stakes";
export * from "./earthworks";
