/**
 * The settings body is defined once in `shared` (the chef's settings form validates with the same
 * schema before sending); re-exported here for the controller and service.
 */
export {
  studioSettingsBodySchema,
  type StudioSettingsBody,
  type StudioSettingsView,
} from '@nappe/shared';
