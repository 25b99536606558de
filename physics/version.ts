/** Version of the physics engine, stored with every result so a figure can be traced to the code that made it. */
export const ENGINE_VERSION = "1.1.3";
