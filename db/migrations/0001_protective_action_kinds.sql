ALTER TABLE `protective_actions` ADD `facility_kinds` text;--> statement-breakpoint
-- Workspaces seeded before this column: give the default actions the kinds they are for (db/seed/workspace-defaults.ts).
UPDATE `protective_actions` SET `facility_kinds` = '["school","hospital","care-home","utility","other"]' WHERE `facility_kinds` IS NULL AND `name` IN ('Drop, cover, hold', 'Move away from windows and shelving', 'Leave a ground-floor building');--> statement-breakpoint
UPDATE `protective_actions` SET `facility_kinds` = '["hospital"]' WHERE `facility_kinds` IS NULL AND `name` = 'Stop surgery and secure patients';--> statement-breakpoint
UPDATE `protective_actions` SET `facility_kinds` = '["rail"]' WHERE `facility_kinds` IS NULL AND `name` = 'Slow and stop trains';
