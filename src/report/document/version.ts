/**
 * The version of flexura that wrote a document, printed in its header so a checker can tell which
 * program produced the numbers. Kept equal to package.json's version by a test.
 */
export const FLEXURA_VERSION = "0.1.0-unreleased";
