// The forecasting and due-point math, as pure functions shared by the server and the client.
export * from './types';
export * from './calendar';
export * from './lifetime';
export * from './usage';
export * from './usage-trend';
export * from './usage-season';
export * from './due-point';
export * from './due-outcomes';
export * from './due-before-peak';
export * from './staleness';
export * from './season-dates';
export * from './reading-rules';
export * from './cost';
export * from './money';
export * from './record-costs';
export * from './due-words';
export * from './hazards';
