/**
 * Accounts and sign-in: users with hashed passwords and one of three roles (viewer, editor, admin),
 * the security rules for pages and API, and the admin page that adds users and sets roles.
 */
package com.wayledger.account;
