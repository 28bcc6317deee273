-- The interface language each user chooses on the account page (account.InterfaceLanguage):
-- FOLLOW_SITE (en-US wording on pages about an NEC-set site, en-GB on an IEC-set one, the browser's
-- choice between the two elsewhere), EN_GB or EN_US. Stored with the user, with a version of its own
-- so that saving the choice from a stale page is refused without touching the rest of the account.
-- One script for PostgreSQL and H2 in PostgreSQL mode; the application's role already writes app_user.

ALTER TABLE app_user ADD COLUMN interface_language VARCHAR(12) NOT NULL DEFAULT 'FOLLOW_SITE';
ALTER TABLE app_user ADD CONSTRAINT app_user_interface_language_known
    CHECK (interface_language IN ('FOLLOW_SITE', 'EN_GB', 'EN_US'));
ALTER TABLE app_user ADD COLUMN interface_language_version BIGINT NOT NULL DEFAULT 0;
