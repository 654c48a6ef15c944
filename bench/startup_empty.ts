// An empty module: bench/startup.ts times Deno starting it, the floor under any command.
export {};
