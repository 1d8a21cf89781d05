/**
 * The broker pattern shared by every family: a registry tracks the providers of one family as they come and go and selects one by id.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.1.0")
package org.redward.api.registry;
