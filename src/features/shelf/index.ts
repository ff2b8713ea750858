// What other features may use of the shelf.
export { actOnJar, useActOnJar } from './api/act-on-jar';
export { useOfferJarUndo } from './api/undo-jar-change';
export { sealCheckTimes } from './seal-check-times';
