// Package robustness holds tests that run the whole engine, method by
// method and verb by verb, on series chosen to break arithmetic: values
// from 1e-9 to 1e12, negative and all-zero series, constant series, series
// of one and three points, and very long series. The promise they check is
// the one the reliability section of the design makes: every output stays
// finite and right, or the step says in plain words why it cannot be
// computed. Nothing here is used by the program; the package has only
// tests.
package robustness
