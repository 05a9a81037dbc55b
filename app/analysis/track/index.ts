// The track on the ground: geometry, checks, line of sight, closing the loop, speed, rules.
export * from "./jump-profile";
export * from "./geometry";
export * from "./close-loop";
export * from "./geometry-checks";
export * from "./sight";
export * from "./lap-jumps";
export * from "./speed";
export * from "./rules";
export * from "./layout-measure";
