// Package browsertest opens the built Quillcast site in Chromium and checks
// what a user would see: the engine starts, the demo renders its charts and
// tables, the console stays free of errors, and no request leaves the page's
// own files.
//
// The tests drive Debian's /usr/bin/chromium through chromedp against the
// folder that `make build` writes (build/site), served in-process on
// 127.0.0.1 with a random port by the same handler as `make serve`. When the
// browser or the built site is missing they are skipped, except with CI=true,
// where that is a failure. Screenshots go to build/screenshots/ for review.
package browsertest
