// Command serve serves a built Quillcast site on the local machine.
//
// Usage:
//
//	go run ./core/cmd/serve [-dir build/site] [-addr 127.0.0.1] [-port 8080]
//
// The address and port default to the environment variables ADDR and PORT,
// and to 127.0.0.1:8080 when those are unset. Port 0 picks a free port. The
// command prints the URL to open and serves until it is stopped. Every
// response carries the page's Content-Security-Policy and the MIME type
// browsers need for WebAssembly (see package
// quillcast/core/cmd/serve/static).
package main

import (
	"errors"
	"flag"
	"fmt"
	"io"
	"net"
	"net/http"
	"os"
	"path/filepath"
	"time"

	"quillcast/core/cmd/serve/static"
)

func main() {
	if err := run(os.Args[1:], os.Getenv, os.Stdout); err != nil {
		fmt.Fprintln(os.Stderr, "serve:", err)
		os.Exit(1)
	}
}

// config is what the command line and the environment ask for.
type config struct {
	dir  string
	addr string
	port string
}

// parseConfig reads the flags, falling back to ADDR and PORT from getenv.
func parseConfig(args []string, getenv func(string) string) (config, error) {
	c := config{dir: "build/site", addr: "127.0.0.1", port: "8080"}
	if v := getenv("ADDR"); v != "" {
		c.addr = v
	}
	if v := getenv("PORT"); v != "" {
		c.port = v
	}
	fs := flag.NewFlagSet("serve", flag.ContinueOnError)
	fs.StringVar(&c.dir, "dir", c.dir, "folder holding the built site (made by `make build`)")
	fs.StringVar(&c.addr, "addr", c.addr, "address to listen on (environment ADDR)")
	fs.StringVar(&c.port, "port", c.port, "port to listen on, 0 for any free port (environment PORT)")
	if err := fs.Parse(args); err != nil {
		return c, err
	}
	if fs.NArg() > 0 {
		return c, fmt.Errorf("unexpected argument %q; use -dir, -addr and -port", fs.Arg(0))
	}
	index := filepath.Join(c.dir, "index.html")
	if _, err := os.Stat(index); err != nil {
		return c, fmt.Errorf("no built site in %q (missing index.html); run `make build` first or pass -dir", c.dir)
	}
	return c, nil
}

// run listens, prints the URL to out and serves until the server fails.
func run(args []string, getenv func(string) string, out io.Writer) error {
	c, err := parseConfig(args, getenv)
	if err != nil {
		return err
	}
	ln, err := net.Listen("tcp", net.JoinHostPort(c.addr, c.port))
	if err != nil {
		return fmt.Errorf("cannot listen on %s:%s (%v); choose another with PORT=... or ADDR=...", c.addr, c.port, err)
	}
	fmt.Fprintf(out, "Quillcast is served from %s at http://%s/ (stop with Ctrl+C)\n", c.dir, ln.Addr())
	srv := &http.Server{Handler: static.Handler(c.dir), ReadHeaderTimeout: 10 * time.Second}
	if err := srv.Serve(ln); err != nil && !errors.Is(err, http.ErrServerClosed) {
		return err
	}
	return nil
}
