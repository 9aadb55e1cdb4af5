ALTER TABLE `shop_settings` ADD `currency` text DEFAULT 'EUR' NOT NULL;--> statement-breakpoint
ALTER TABLE `shop_settings` ADD `labour_rate_minor` integer;--> statement-breakpoint
ALTER TABLE `shop_settings` ADD `tax_percent` real DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `shop_settings` ADD `deposit_percent` real DEFAULT 30 NOT NULL;--> statement-breakpoint
ALTER TABLE `job` ADD `quote_json` text;--> statement-breakpoint
ALTER TABLE `job` ADD `approved_quote_json` text;--> statement-breakpoint
-- A kit's price was a bare number in the shop's (then only) currency, euros: it becomes money, integer cents with the ISO 4217 code.
UPDATE `cylinder_kit` SET `data_json` = json_set(`data_json`, '$.price', json_object('amountMinor', CAST(round(json_extract(`data_json`, '$.price') * 100) AS INTEGER), 'currency', 'EUR')) WHERE json_type(`data_json`, '$.price') IN ('integer', 'real');
