export { HAZARD_LABELS, SAFETY_DEFERRAL, hazardLabel } from '../../../../shared/constants';
