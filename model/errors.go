package model

import (
	"fmt"
	"strings"
)

// Every error that reaches a user is built by Errorf (or is a type with a
// UserMessage method), so that callers never strip package prefixes by
// string replacement: Error() reads "model: …" for logs and tests, and
// UserMessage() is the one line a person is shown.

// Error is an error with a package prefix for logs and a line for users.
type Error struct {
	Pkg  string // "model", "mixtures", …; "" for none
	Kind error  // a sentinel that errors.Is matches; nil for none
	msg  string // the user's line
	err  error  // what fmt.Errorf made of the %w arguments
}

// Errorf formats an error as fmt.Errorf does, under the package prefix
// pkg. Errors passed to %w or %v contribute their own UserMessage, so a
// chain of context reads as one line with no prefix in the middle; %w
// still wraps for errors.Is and errors.As.
func Errorf(pkg, format string, args ...any) error {
	return KindErrorf(pkg, nil, format, args...)
}

// KindErrorf is Errorf for an error of a kind (a sentinel such as
// ErrTemperature) that errors.Is should match without the kind's own
// text appearing in the message.
func KindErrorf(pkg string, kind error, format string, args ...any) error {
	shown := make([]any, len(args))
	for i, a := range args {
		if e, ok := a.(error); ok {
			shown[i] = UserMessage(e)
		} else {
			shown[i] = a
		}
	}
	return &Error{
		Pkg:  pkg,
		Kind: kind,
		msg:  fmt.Sprintf(strings.ReplaceAll(format, "%w", "%v"), shown...),
		err:  fmt.Errorf(format, args...),
	}
}

func (e *Error) Error() string {
	if e.Pkg == "" {
		return e.msg
	}
	return e.Pkg + ": " + e.msg
}

// UserMessage is the message without the package prefix.
func (e *Error) UserMessage() string { return e.msg }

// Is matches the error's kind.
func (e *Error) Is(target error) bool { return e.Kind != nil && target == e.Kind }

// Unwrap returns the errors given to %w.
func (e *Error) Unwrap() []error {
	switch u := e.err.(type) {
	case interface{ Unwrap() []error }:
		return u.Unwrap()
	case interface{ Unwrap() error }:
		if w := u.Unwrap(); w != nil {
			return []error{w}
		}
	}
	return nil
}

// UserMessage returns the line a person should read for err: its
// UserMessage when it has one, else its Error text, on one line.
func UserMessage(err error) string {
	if err == nil {
		return ""
	}
	var msg string
	if um, ok := err.(interface{ UserMessage() string }); ok {
		msg = um.UserMessage()
	} else {
		msg = err.Error()
	}
	return strings.NewReplacer("\r\n", " ", "\n", " ", "\r", " ").Replace(msg)
}
