// Closed-form theory shared by the server and the client (pure: no I/O, no Node APIs).
export * from "./critical-rate";
export * from "./complexity-total";
export * from "./complexity-stable";
export * from "./stable-boundary";
export * from "./regime";
export * from "./index-share";
export * from "./elliptic-ellipse";
export * from "./rate-lines";
export * from "./real-eigenvalues";
export * from "./total-count-large-n";
export * from "./curves";
