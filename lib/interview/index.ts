export * from "./answers";
export * from "./branches";
export * from "./cautions";
export * from "./progress";
export * from "./route";
export * from "./steps";
export * from "./to-diagnosis-input";
export * from "./validate";
