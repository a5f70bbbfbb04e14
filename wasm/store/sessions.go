//go:build js && wasm

package store

import (
	"cmp"
	"encoding/json"
	"fmt"
	"slices"
	"strings"
	"time"
)

// Session is one stored session: its text form and the datasets it uses.
type Session struct {
	ID       string   `json:"id"`
	Title    string   `json:"title"`
	Text     string   `json:"text"`     // the session document (markdown with step blocks)
	Datasets []string `json:"datasets"` // names of the datasets the session uses
	// Version counts saves from 1. A session passed to [Sessions.Save]
	// carries the version it was opened at (0 for a new session).
	Version int    `json:"version"`
	Saved   string `json:"saved"` // time of the last save, RFC 3339 in UTC
}

// Summary is what the session list shows.
type Summary struct {
	ID      string `json:"id"`
	Title   string `json:"title"`
	Version int    `json:"version"`
	Saved   string `json:"saved"`
}

// Sessions stores sessions in a [Backend].
type Sessions struct {
	b     Backend
	now   func() time.Time
	newID func() string
}

// NewSessions returns the session store over b. now gives the time stamped
// on saves; newID gives a fresh unique id for new and duplicated sessions.
func NewSessions(b Backend, now func() time.Time, newID func() string) *Sessions {
	return &Sessions{b: b, now: now, newID: newID}
}

// List returns every session, the most recently saved first.
func (s *Sessions) List() ([]Summary, error) {
	all, err := s.b.All(SessionBucket)
	if err != nil {
		return nil, err
	}
	out := make([]Summary, 0, len(all))
	for id, raw := range all {
		var sess Session
		if err := json.Unmarshal(raw, &sess); err != nil {
			return nil, fmt.Errorf("the stored session %q is damaged (%v); export your other sessions, then delete it", id, err)
		}
		out = append(out, Summary{ID: sess.ID, Title: sess.Title, Version: sess.Version, Saved: sess.Saved})
	}
	slices.SortFunc(out, func(a, b Summary) int {
		return cmp.Or(strings.Compare(b.Saved, a.Saved), strings.Compare(a.ID, b.ID))
	})
	return out, nil
}

// Get returns the session with the given id, or [ErrNotFound].
func (s *Sessions) Get(id string) (Session, error) {
	raw, ok, err := s.b.Get(SessionBucket, id)
	if err != nil {
		return Session{}, err
	}
	if !ok {
		return Session{}, fmt.Errorf("session %q: %w; it may have been deleted in another tab", id, ErrNotFound)
	}
	var sess Session
	if err := json.Unmarshal(raw, &sess); err != nil {
		return Session{}, fmt.Errorf("the stored session %q is damaged (%v)", id, err)
	}
	return sess, nil
}

// Save stores sess and returns it with its new version and time. A session
// without an id gets one. sess.Version must be the version it was opened at:
// when the stored session is newer (saved by another tab), Save stores
// nothing and returns [ErrConflict].
func (s *Sessions) Save(sess Session) (Session, error) {
	if sess.ID == "" {
		sess.ID = s.newID()
	}
	opened := sess.Version
	sess.Version = opened + 1
	sess.Saved = s.now().UTC().Format(time.RFC3339Nano)
	if sess.Datasets == nil {
		sess.Datasets = []string{}
	}
	raw, err := json.Marshal(sess)
	if err != nil {
		return Session{}, err
	}
	err = s.b.Swap(SessionBucket, sess.ID, raw, func(old []byte, found bool) error {
		stored := 0
		if found {
			var prev Session
			if err := json.Unmarshal(old, &prev); err == nil {
				stored = prev.Version
			}
		}
		if stored != opened {
			return fmt.Errorf("%w (version %d there, %d here); reload it to see those changes or save yours as a copy", ErrConflict, stored, opened)
		}
		return nil
	})
	if err != nil {
		return Session{}, err
	}
	return sess, nil
}

// Rename gives the session a new title, as a save of its stored version.
func (s *Sessions) Rename(id, title string) (Session, error) {
	sess, err := s.Get(id)
	if err != nil {
		return Session{}, err
	}
	sess.Title = title
	return s.Save(sess)
}

// Duplicate stores a copy of the session under a new id and title.
func (s *Sessions) Duplicate(id, title string) (Session, error) {
	sess, err := s.Get(id)
	if err != nil {
		return Session{}, err
	}
	sess.ID, sess.Title, sess.Version = "", title, 0
	return s.Save(sess)
}

// Delete removes the session; its datasets stay.
func (s *Sessions) Delete(id string) error {
	return s.b.Delete(SessionBucket, id)
}
