// A jump's ballistic flight and its speed window.
export * from "./flight";
export * from "./flight-window";
export * from "./whoops";
