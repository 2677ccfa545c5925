'use client';

import { Component, type ReactNode } from 'react';

/** Shows `fallback` when the 3D view throws (for example when a WebGL context cannot be made). */
export default class SceneErrorBoundary extends Component<{ fallback: ReactNode; children: ReactNode }, { failed: boolean }> {
  state = { failed: false };
  static getDerivedStateFromError() {
    return { failed: true };
  }
  render() {
    return this.state.failed ? this.props.fallback : this.props.children;
  }
}
