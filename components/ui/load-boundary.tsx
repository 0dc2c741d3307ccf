"use client";

import { Component, type ReactNode } from "react";

// Around a lazily loaded part: if its code cannot be fetched (the connection
// dropped after the page loaded), say so in its place instead of replacing the
// whole page with the error page.
export class LoadBoundary extends Component<{ what: string; children: ReactNode }, { failed: boolean }> {
  state = { failed: false };

  static getDerivedStateFromError() {
    return { failed: true };
  }

  render() {
    if (!this.state.failed) return this.props.children;
    return (
      <p role="alert" className="font-semibold text-alarm">
        The {this.props.what} could not be loaded. Check your connection, then reload the page.
      </p>
    );
  }
}
