// What other features may use of the household: the gate that asks for its canning setup first.
export { AltitudeGate } from './components/altitude-gate';
