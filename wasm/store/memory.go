//go:build js && wasm

package store

import (
	"maps"
	"slices"
	"sync"
)

// Memory is a [Backend] held in memory: it forgets everything when the page
// closes. The zero value is not usable; call [NewMemory].
type Memory struct {
	mu      sync.Mutex
	buckets map[string]map[string][]byte
}

// NewMemory returns an empty in-memory backend.
func NewMemory() *Memory {
	return &Memory{buckets: map[string]map[string][]byte{}}
}

// Kind returns "memory".
func (m *Memory) Kind() string { return "memory" }

// Get implements [Backend].
func (m *Memory) Get(bucket, key string) ([]byte, bool, error) {
	m.mu.Lock()
	defer m.mu.Unlock()
	v, ok := m.buckets[bucket][key]
	return slices.Clone(v), ok, nil
}

// Put implements [Backend].
func (m *Memory) Put(bucket, key string, value []byte) error {
	m.mu.Lock()
	defer m.mu.Unlock()
	m.put(bucket, key, value)
	return nil
}

func (m *Memory) put(bucket, key string, value []byte) {
	b := m.buckets[bucket]
	if b == nil {
		b = map[string][]byte{}
		m.buckets[bucket] = b
	}
	b[key] = slices.Clone(value)
}

// Swap implements [Backend].
func (m *Memory) Swap(bucket, key string, value []byte, check func([]byte, bool) error) error {
	m.mu.Lock()
	defer m.mu.Unlock()
	old, ok := m.buckets[bucket][key]
	if err := check(slices.Clone(old), ok); err != nil {
		return err
	}
	m.put(bucket, key, value)
	return nil
}

// Delete implements [Backend].
func (m *Memory) Delete(bucket, key string) error {
	m.mu.Lock()
	defer m.mu.Unlock()
	delete(m.buckets[bucket], key)
	return nil
}

// All implements [Backend].
func (m *Memory) All(bucket string) (map[string][]byte, error) {
	m.mu.Lock()
	defer m.mu.Unlock()
	out := make(map[string][]byte, len(m.buckets[bucket]))
	for k, v := range m.buckets[bucket] {
		out[k] = slices.Clone(v)
	}
	return out, nil
}

// Clear implements [Backend].
func (m *Memory) Clear() error {
	m.mu.Lock()
	defer m.mu.Unlock()
	clear(m.buckets)
	return nil
}

// keys returns a bucket's keys in order (for tests).
func (m *Memory) keys(bucket string) []string {
	m.mu.Lock()
	defer m.mu.Unlock()
	return slices.Sorted(maps.Keys(m.buckets[bucket]))
}
