/** Text tables, CSV and JSON writers for evaluations and shortlists. */
package dev.yoke.report;
