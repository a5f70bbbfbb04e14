package main

import (
	"bytes"
	"compress/gzip"
	"encoding/json"
	"fmt"
	"os"
	"os/exec"
)

// numpyRun is what testdata/bench/sweep_numpy.py prints.
type numpyRun struct {
	Seconds   []float64 `json:"seconds"`
	MAE, RMSE []float64
	Version   string `json:"numpy"`
}

// statsRun is what testdata/bench/hw_statsmodels.py prints.
type statsRun struct {
	Seconds            []float64 `json:"seconds"`
	SSE                float64   `json:"sse"`
	Alpha, Beta, Gamma float64
	Version            string `json:"statsmodels"`
}

// python runs a script of testdata/bench with args and decodes the JSON it
// prints into v.
func python(interp, script string, v any, args ...any) error {
	cmdArgs := []string{script}
	for _, a := range args {
		cmdArgs = append(cmdArgs, fmt.Sprint(a))
	}
	cmd := exec.Command(interp, cmdArgs...)
	var stderr bytes.Buffer
	cmd.Stderr = &stderr
	out, err := cmd.Output()
	if err != nil {
		return fmt.Errorf("%s %s: %v: %s", interp, script, err, stderr.String())
	}
	if err := json.Unmarshal(out, v); err != nil {
		return fmt.Errorf("%s printed something other than one JSON object: %v", script, err)
	}
	return nil
}

// secondsOf turns a script's list of seconds into a sample.
func secondsOf(v []float64) sample { return sample{Values: v, Unit: "s"} }

// gzipSize returns the size of b compressed by gzip at level 9, as
// `gzip -9` writes it.
func gzipSize(b []byte) (int, error) {
	var buf bytes.Buffer
	w, err := gzip.NewWriterLevel(&buf, gzip.BestCompression)
	if err != nil {
		return 0, err
	}
	if _, err := w.Write(b); err != nil {
		return 0, err
	}
	if err := w.Close(); err != nil {
		return 0, err
	}
	return buf.Len(), nil
}

// brotliSize returns the size of the file compressed by the brotli
// command at its best quality, or an error when brotli is not installed.
func brotliSize(path string) (int, error) {
	bin, err := exec.LookPath("brotli")
	if err != nil {
		return 0, fmt.Errorf("brotli is not installed (apt-get install brotli)")
	}
	out, err := exec.Command(bin, "-c", "-q", "11", path).Output()
	if err != nil {
		return 0, fmt.Errorf("brotli %s: %v", path, err)
	}
	return len(out), nil
}

// fileSize returns the size of a file in bytes.
func fileSize(path string) (int, error) {
	st, err := os.Stat(path)
	if err != nil {
		return 0, err
	}
	return int(st.Size()), nil
}

// bytesSample is one size measurement as a sample.
func bytesSample(n int) sample { return sample{Values: []float64{float64(n)}, Unit: "B"} }
