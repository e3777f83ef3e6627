export * from "./ball-nose";
export * from "./deflection";
export * from "./engagement";
export * from "./plunge";
export * from "./power";
export * from "./speed-feed";
