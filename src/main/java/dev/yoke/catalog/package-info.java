/** Loading, validating and saving catalog and scenario files (YAML through Jackson), with file:line:column errors. */
package dev.yoke.catalog;
