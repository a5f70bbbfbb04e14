package main

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

func TestParseConfig(t *testing.T) {
	t.Parallel()
	site := t.TempDir()
	if err := os.WriteFile(filepath.Join(site, "index.html"), []byte("<!doctype html>"), 0o644); err != nil {
		t.Fatal(err)
	}
	tests := []struct {
		name    string
		args    []string
		env     map[string]string
		want    config
		wantErr string
	}{
		{"defaults", []string{"-dir", site}, nil, config{site, "127.0.0.1", "8080"}, ""},
		{"environment", []string{"-dir", site}, map[string]string{"ADDR": "0.0.0.0", "PORT": "9001"}, config{site, "0.0.0.0", "9001"}, ""},
		{"flags beat environment", []string{"-dir", site, "-port", "0"}, map[string]string{"PORT": "9001"}, config{site, "127.0.0.1", "0"}, ""},
		{"no site", []string{"-dir", filepath.Join(site, "none")}, nil, config{}, "run `make build` first"},
		{"stray argument", []string{"-dir", site, "extra"}, nil, config{}, `unexpected argument "extra"`},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			got, err := parseConfig(tc.args, func(k string) string { return tc.env[k] })
			if tc.wantErr != "" {
				if err == nil || !strings.Contains(err.Error(), tc.wantErr) {
					t.Fatalf("parseConfig(%q) error %v, want one containing %q", tc.args, err, tc.wantErr)
				}
				return
			}
			if err != nil {
				t.Fatalf("parseConfig(%q): %v", tc.args, err)
			}
			if got != tc.want {
				t.Errorf("parseConfig(%q) = %+v, want %+v", tc.args, got, tc.want)
			}
		})
	}
}
