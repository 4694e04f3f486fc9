// The allergy notes' contract lives in shared, with the admin that reads it.
export type {
  RecordedSubstitution,
  GuestPlateNote,
  GuestNote,
  UnresolvedConflict,
  AllergyNotes,
  BriefingGuest,
  BriefingTable,
  Briefing,
  AccessLogEntry,
  AllergyCounts,
} from '@nappe/shared';
