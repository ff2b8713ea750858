// What other features may use of the shelf.
export { actOnJar, jarChange, jarChangeDefaults, useActOnJar, type ActedJar, type JarChange } from './api/act-on-jar';
export { useOfferJarUndo } from './api/undo-jar-change';
export { sealCheckTimes } from './seal-check-times';
